import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Ajv2020 from 'ajv/dist/2020';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { csrfAgent, signedInAgent, type CsrfAgent } from '../helpers/agent';
import { exampleText } from '../helpers/examples';
import { startReviewApp, WHO, type ReviewApp } from './review-helpers';

let t: ReviewApp;
let owner: CsrfAgent;
let instructor: CsrfAgent;
let otherAuthor: CsrfAgent;
let curator: CsrfAgent;
let setId: number;

const bytes = (req: ReturnType<CsrfAgent['get']>) => req.responseType('blob');

beforeAll(async () => {
  t = await startReviewApp();
  [owner, instructor, otherAuthor, curator] = await Promise.all(
    [WHO.owner, WHO.instructor, WHO.otherAuthor, WHO.curator].map((email) => signedInAgent(t.url, email)),
  );
  await owner.post('/api/mechanisms', { slug: 'bromine', title: 'Salt-lake bromine cycle', source: exampleText('salt-lake-bromine.steps') });
  await owner.post('/api/mechanisms', { slug: 'nox', title: 'Stratospheric NOx', source: exampleText('stratospheric-nox.steps') });
  await owner.post('/api/mechanisms', { slug: 'secret', title: 'Unpublished', visibility: 'private', source: exampleText('clo-dimer.steps') });
  setId = (await instructor.post('/api/sets', {
    title: 'Catalytic ozone loss', audience: 'Short course',
    items: [{ mechanism: 'bromine', revision: 1, note: 'Bromine first' }, { mechanism: 'nox', revision: 1 }],
  })).body.id;
});
afterAll(async () => t.close());

describe('GET /api/exports/mechanisms/:slug/revisions/:number', () => {
  it.each([
    ['md', /^text\/markdown/, '| B1 | `Br• + O3 → BrO• + O2` |'],
    ['tex', /^application\/x-tex/, '\\ce{Br^{.} + O3 -> BrO^{.} + O2}'],
    ['csv', /^text\/csv/, 'bromine,1,B1,Br• + O3 → BrO• + O2,1.7e-11 * exp(-800 / T),propagation,true,-128.744,'],
    ['json', /^application\/json/, '"format": "cyclewright-export"'],
  ])('serves %s as an attachment with the expected content', async (format, type, expected) => {
    const res = await bytes(owner.get(`/api/exports/mechanisms/bromine/revisions/1?format=${format}&answers=true`));
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(type);
    expect(res.headers['content-disposition']).toContain(`bromine-r1-answers.${format}`);
    expect((res.body as Buffer).toString('utf8')).toContain(expected);
  });

  it('serves a PDF worksheet whose text holds the equations', async () => {
    const res = await bytes(otherAuthor.get('/api/exports/mechanisms/bromine/revisions/1?format=pdf'));
    expect(res.headers['content-type']).toBe('application/pdf');
    const file = join(mkdtempSync(join(tmpdir(), 'export-')), 'sheet.pdf');
    writeFileSync(file, res.body as Buffer);
    const text = execFileSync('pdftotext', ['-raw', '-enc', 'UTF-8', file, '-'], { encoding: 'utf8' });
    expect(text).toContain('Br• + O3 → BrO• + O2');
    expect(text).toContain('Br2 + hν → 2 Br•');
  });

  it('never exports a private mechanism to someone who may not see it (404, like a missing one)', async () => {
    for (const client of [otherAuthor, instructor]) {
      const res = await client.get('/api/exports/mechanisms/secret/revisions/1?format=json');
      expect(res.status).toBe(404);
      expect(JSON.stringify(res.body)).not.toContain('ClO');
    }
    expect((await curator.get('/api/exports/mechanisms/secret/revisions/1?format=json')).status).toBe(200);
    expect((await owner.get('/api/exports/mechanisms/secret/revisions/1?format=json')).status).toBe(200);
  });

  it('answers 401 signed out and 400 naming the field for an unknown format', async () => {
    expect((await (await csrfAgent(t.url)).get('/api/exports/mechanisms/bromine/revisions/1?format=md')).status).toBe(401);
    const res = await owner.get('/api/exports/mechanisms/bromine/revisions/1?format=docx');
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].path).toEqual(['format']);
  });
});

describe('GET /api/exports/sets/:id', () => {
  it('exports the whole set in order, with the set title and notes, valid against the published schema', async () => {
    const schema = (await (await csrfAgent(t.url)).get('/api/schemas/mechanism-export.json')).body;
    const res = await otherAuthor.get(`/api/exports/sets/${setId}?format=json&answers=true`);
    const validate = new Ajv2020({ strict: false }).compile(schema);
    expect(validate(res.body)).toBe(true);
    expect(res.body.set).toEqual({ title: 'Catalytic ozone loss', audience: 'Short course' });
    expect(res.body.mechanisms.map((m: { slug: string; note: string }) => [m.slug, m.note])).toEqual([['bromine', 'Bromine first'], ['nox', '']]);
    expect(res.body.mechanisms[0].answers.catalysts).toEqual(['Br•']);
  });

  it('leaves the answer key out unless asked for', async () => {
    const res = await otherAuthor.get(`/api/exports/sets/${setId}?format=json`);
    expect(res.body.answerKey).toBe(false);
    expect(res.body.mechanisms.every((m: object) => !('answers' in m))).toBe(true);
  });

  it('refuses a set once one of its mechanisms is private to the reader — even its owner', async () => {
    await owner.patch('/api/mechanisms/nox', { visibility: 'private' });
    try {
      expect((await otherAuthor.get(`/api/exports/sets/${setId}?format=csv`)).status).toBe(404);
      expect((await instructor.get(`/api/exports/sets/${setId}?format=csv`)).status).toBe(404);
      expect((await curator.get(`/api/exports/sets/${setId}?format=csv`)).status).toBe(200);
    } finally {
      await owner.patch('/api/mechanisms/nox', { visibility: 'public' });
    }
  });
});
