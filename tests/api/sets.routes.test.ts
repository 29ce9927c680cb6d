import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, type CsrfAgent } from '../helpers/agent';
import { startReviewApp, WHO, type ReviewApp } from './review-helpers';

const BROMINE = 'B1: Br• + O3 -> BrO• + O2 @ 1.7e-11 * exp(-800 / T)\nB2: BrO• + BrO• -> 2 Br• + O2 @ 2.4e-12 * exp(40 / T)\n';

let t: ReviewApp;
let instructor: CsrfAgent;
let owner: CsrfAgent;
let otherAuthor: CsrfAgent;

beforeAll(async () => {
  t = await startReviewApp();
  [instructor, owner, otherAuthor] = await Promise.all([WHO.instructor, WHO.owner, WHO.otherAuthor].map((email) => signedInAgent(t.url, email)));
  await owner.post('/api/mechanisms', { slug: 'set-public', title: 'Public bromine', source: BROMINE });
  await owner.post('/api/mechanisms/set-public/revisions', { base: 1, source: `${BROMINE}# r2\n` });
  await owner.post('/api/mechanisms', { slug: 'set-private', title: 'Private bromine', visibility: 'private', source: BROMINE });
});
afterAll(async () => t.close());

const items = [{ mechanism: 'set-public', revision: 2, note: 'Start here' }, { mechanism: 'set-public', revision: 1, note: '' }];

describe('POST /api/sets', () => {
  it('answers 403 to anyone without the instructor role', async () => {
    for (const client of [owner, otherAuthor]) {
      const res = await client.post('/api/sets', { title: 'Not mine', items });
      expect(res.status).toBe(403);
    }
  });

  it('lets an instructor build an ordered set of revisions with notes, recorded in the audit log', async () => {
    const res = await instructor.post('/api/sets', { title: 'Halogen cycles', audience: 'Short course, day 2', items });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      title: 'Halogen cycles', audience: 'Short course, day 2', youOwn: true,
      items: [
        { position: 1, mechanism: { slug: 'set-public', title: 'Public bromine' }, revision: 2, note: 'Start here' },
        { position: 2, mechanism: { slug: 'set-public' }, revision: 1, note: '' },
      ],
    });
    const audit = await t.db('audit_log').where({ subject_type: 'set', subject_id: String(res.body.id) });
    expect(audit.map((row) => row.action)).toEqual(['set.created']);
  });

  it('refuses a revision that does not exist (422 naming the item) and a mechanism the instructor may not see (404)', async () => {
    const missing = await instructor.post('/api/sets', { title: 'x', items: [{ mechanism: 'set-public', revision: 9 }] });
    expect(missing.status).toBe(422);
    expect(missing.body.error.details.field).toBe('items.0.revision');
    const hidden = await instructor.post('/api/sets', { title: 'x', items: [{ mechanism: 'set-private', revision: 1 }] });
    expect(hidden.status).toBe(404);
    expect(await t.db('mechanism_sets').where({ title: 'x' })).toHaveLength(0);
  });

  it('validates the body and names the field', async () => {
    const res = await instructor.post('/api/sets', { title: '', items: [{ mechanism: 'set-public', revision: 0 }] });
    expect(res.status).toBe(400);
    expect(res.body.error.details.map((d: { path: string[] }) => d.path.join('.'))).toEqual(['title', 'items.0.revision']);
  });
});

describe('reading, changing and deleting sets', () => {
  it('lets signed-in people read a set of public mechanisms; only its owner changes or deletes it', async () => {
    const { id } = (await instructor.post('/api/sets', { title: 'Readable', items })).body;
    expect((await otherAuthor.get(`/api/sets/${id}`)).body).toMatchObject({ title: 'Readable', youOwn: false });
    expect((await otherAuthor.get('/api/sets')).body.map((s: { id: number }) => s.id)).toContain(id);
    const second = await signedInAgent(t.url, WHO.instructor);
    expect((await owner.patch(`/api/sets/${id}`, { title: 'Mine now' })).status).toBe(403);
    const changed = await second.patch(`/api/sets/${id}`, { items: [items[1]] });
    expect(changed.body.items).toEqual([expect.objectContaining({ position: 1, revision: 1 })]);
    expect((await second.delete(`/api/sets/${id}`)).status).toBe(204);
    expect((await otherAuthor.get(`/api/sets/${id}`)).status).toBe(404);
  });

  it('hides a set holding a private mechanism from those who may not see that mechanism', async () => {
    const { id } = (await instructor.post('/api/sets', { title: 'Mixed', items })).body;
    await owner.patch('/api/mechanisms/set-public', { visibility: 'private' });
    try {
      expect((await otherAuthor.get(`/api/sets/${id}`)).status).toBe(404);
      expect((await otherAuthor.get('/api/sets')).body.map((s: { id: number }) => s.id)).not.toContain(id);
      expect((await owner.get(`/api/sets/${id}`)).status).toBe(200);
    } finally {
      await owner.patch('/api/mechanisms/set-public', { visibility: 'public' });
    }
  });
});

describe('what the set editor shows at its fields', () => {
  it('words validation messages to stand at the field', async () => {
    const res = await instructor.post('/api/sets', { title: ' ', items: [{ mechanism: '', revision: 1 }, { mechanism: 'set-public' }] });
    expect(res.status).toBe(400);
    expect(res.body.error.details).toEqual([
      { path: ['title'], message: 'Give the set a title' },
      { path: ['items', '0', 'mechanism'], message: 'Choose a mechanism' },
      { path: ['items', '1', 'revision'], message: 'Choose a revision' },
    ]);
  });

  it('names the item, from 1, and the latest revision when a revision does not exist', async () => {
    const res = await instructor.post('/api/sets', { title: 'x', items: [items[0], { mechanism: 'set-public', revision: 5 }] });
    expect(res.status).toBe(422);
    expect(res.body.error).toMatchObject({
      code: 'UNKNOWN_REVISION',
      message: 'Mechanism 2: set-public has no revision r5 (latest is r2)',
      details: { field: 'items.1.revision', latest: 2 },
    });
  });

  it('says a mechanism one may not see is not visible or does not exist, without telling which', async () => {
    for (const slug of ['set-private', 'no-such-mechanism']) {
      const res = await instructor.post('/api/sets', { title: 'x', items: [{ mechanism: slug, revision: 1 }] });
      expect(res.status).toBe(404);
      expect(res.body.error).toMatchObject({
        code: 'UNKNOWN_MECHANISM', message: `Mechanism 1: ${slug} is not visible to you or does not exist`, details: { field: 'items.0.mechanism' },
      });
    }
  });

  it('gives each item its mechanism\'s latest and reference revisions, to offer the others', async () => {
    const { body } = await instructor.post('/api/sets', { title: 'Revisions', items: [items[1]] });
    expect(body.items[0].mechanism).toEqual({ slug: 'set-public', title: 'Public bromine', latestRevision: 2, referenceRevision: null });
  });
});

describe('GET /api/sets/mechanism-choices', () => {
  const slugs = (res: { body: Array<{ slug: string }> }) => res.body.map((choice) => choice.slug);

  it('offers the mechanisms the instructor can see, found by any part of the title or address', async () => {
    const all = await instructor.get('/api/sets/mechanism-choices');
    expect(all.status).toBe(200);
    expect(slugs(all)).toContain('set-public');
    expect(slugs(all)).not.toContain('set-private');
    const typed = await instructor.get('/api/sets/mechanism-choices?q=ic%20brom');
    expect(typed.body).toEqual([{ slug: 'set-public', title: 'Public bromine', visibility: 'public', ownerName: expect.any(String), latestRevision: 2, referenceRevision: null }]);
    expect(slugs(await instructor.get('/api/sets/mechanism-choices?q=SET-PUB'))).toEqual(['set-public']);
  });

  it('reads % and _ as letters, not patterns', async () => {
    expect((await instructor.get('/api/sets/mechanism-choices?q=%25')).body).toEqual([]);
    expect((await instructor.get('/api/sets/mechanism-choices?q=set_public')).body).toEqual([]);
  });

  it('answers 403 to anyone without the instructor role', async () => {
    expect((await owner.get('/api/sets/mechanism-choices')).status).toBe(403);
  });
});
