import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, type CsrfAgent } from '../helpers/agent';
import { exampleText } from '../helpers/examples';
import { startReviewApp, WHO, type ReviewApp } from './review-helpers';

const MAX_BYTES = 64 * 1024;
let t: ReviewApp;
let owner: CsrfAgent;
let instructor: CsrfAgent;

beforeAll(async () => {
  t = await startReviewApp({ maxImportBytes: MAX_BYTES });
  [owner, instructor] = await Promise.all([WHO.owner, WHO.instructor].map((email) => signedInAgent(t.url, email)));
});
afterAll(async () => t.close());

type Upload = [name: string, content: string | Buffer];

function upload(client: CsrfAgent, path: string, files: Upload[], fields: Record<string, string> = {}) {
  const req = client.agent.post(path).set('X-CSRF-Token', client.token);
  for (const [name, value] of Object.entries(fields)) req.field(name, value);
  for (const [name, content] of files) req.attach('files', Buffer.from(content), name);
  return req;
}

const mechanismCount = async () => Number((await t.db('mechanisms').count({ n: '*' }))[0].n);

describe('POST /api/imports/preview', () => {
  it('analyses each uploaded .steps file and stores nothing', async () => {
    const before = await mechanismCount();
    const res = await upload(owner, '/api/imports/preview', [['salt-lake-bromine.steps', exampleText('salt-lake-bromine.steps')], ['iodide-peroxide.steps', exampleText('iodide-peroxide.steps')]]);
    expect(res.status).toBe(200);
    expect(res.body.map((p: { slug: string; steps: number; errors: number }) => [p.slug, p.steps, p.errors])).toEqual([['salt-lake-bromine', 5, 0], ['iodide-peroxide', 2, 0]]);
    expect(res.body[0].routes).toContain('2 O3 → 3 O2');
    expect(await mechanismCount()).toBe(before);
  });

  it('refuses an empty file, or one without a step, in its own row so the other files still preview', async () => {
    const res = await upload(owner, '/api/imports/preview', [['empty.steps', ''], ['notes.steps', '# to be written\n\n'], ['good.steps', 'A1: O3 -> O2 + O(3P)\n']]);
    expect(res.status).toBe(200);
    expect(res.body.map((p: { file: string; refusal: string | null }) => [p.file, p.refusal])).toEqual([
      ['empty.steps', 'the file is empty'],
      ['notes.steps', 'the file has no steps (only blank lines, comments or directives)'],
      ['good.steps', null],
    ]);
  });

  it('answers 403 to someone without the author role', async () => {
    expect((await upload(instructor, '/api/imports/preview', [['a.steps', 'A1: O3 -> O2 + O(3P)\n']])).status).toBe(403);
  });
});

describe('POST /api/imports', () => {
  it('creates one mechanism per file, private by default, with a free slug', async () => {
    const text = exampleText('hydrogen-bromine-chain.steps');
    const res = await upload(owner, '/api/imports', [['hbr.steps', text], ['hbr.steps', text]]);
    expect(res.status).toBe(201);
    expect(res.body.created.map((c: { slug: string }) => c.slug)).toEqual(['hbr', 'hbr-2']);
    const stored = await owner.get('/api/mechanisms/hbr-2');
    expect(stored.body).toMatchObject({ visibility: 'private', title: 'Hydrogen-bromine chain reaction' });
    expect((await owner.get('/api/mechanisms/hbr/revisions/1')).body.source).toBe(text);
  });

  it('round-trips a JSON export of a set: same texts, same analysis', async () => {
    await owner.post('/api/mechanisms', { slug: 'trip-bromine', title: 'Trip bromine', source: exampleText('salt-lake-bromine.steps') });
    await owner.post('/api/mechanisms', { slug: 'trip-surface', title: 'Trip surface', source: exampleText('co-oxidation-surface.steps') });
    const set = await (await signedInAgent(t.url, WHO.instructor)).post('/api/sets', { title: 'Trip', items: [{ mechanism: 'trip-bromine', revision: 1 }, { mechanism: 'trip-surface', revision: 1 }] });
    const exported = (await owner.get(`/api/exports/sets/${set.body.id}?format=json&answers=true`)).body;
    const file: Upload = ['trip.json', JSON.stringify(exported)];
    const preview = await upload(owner, '/api/imports/preview', [file]);
    expect(preview.body.map((p: { matchesExport: boolean }) => p.matchesExport)).toEqual([true, true]);
    const created = (await upload(owner, '/api/imports', [file], { visibility: 'public' })).body.created;
    expect(created.map((c: { slug: string }) => c.slug)).toEqual(['trip-bromine-2', 'trip-surface-2']);
    for (const [index, { slug }] of created.entries()) {
      const again = (await owner.get(`/api/exports/mechanisms/${slug}/revisions/1?format=json&answers=true`)).body.mechanisms[0];
      const original = exported.mechanisms[index];
      expect(again.source).toBe(original.source);
      expect(again.steps).toEqual(original.steps);
      expect(again.answers).toEqual(original.answers);
    }
  });
});

describe('bad uploads', () => {
  it.each([
    ['an oversized file', [['big.steps', `# ${'x'.repeat(MAX_BYTES)}\n`]], 413, 'FILE_TOO_LARGE'],
    ['a binary file', [['picture.steps', Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13])]], 415, 'NOT_TEXT'],
    ['text with control bytes', [['nul.steps', 'A1: O3 -> O2 + O(3P)\u0000\n']], 415, 'NOT_TEXT'],
    ['a file of another kind', [['mechanism.docx', 'A1: O3 -> O2 + O(3P)\n']], 415, 'UNSUPPORTED_FILE'],
    ['JSON that does not parse', [['broken.json', '{"format": ']], 422, 'IMPORT_INVALID'],
    ['JSON of the wrong shape', [['other.json', JSON.stringify({ format: 'something-else', mechanisms: [] })]], 422, 'IMPORT_INVALID'],
    ['no file at all', [], 400, 'NO_FILES'],
    ['an empty .steps file', [['empty.steps', '']], 422, 'IMPORT_INVALID'],
    ['a .steps file of only blanks and comments', [['notes.steps', '\n  \n# to be written\n%title Later\n']], 422, 'IMPORT_INVALID'],
  ] as Array<[string, Upload[], number, string]>)('refuses %s with a clear error and imports nothing', async (_what, files, status, code) => {
    const before = await mechanismCount();
    const good: Upload = ['good.steps', 'A1: O3 -> O2 + O(3P)\n'];
    const res = await upload(owner, '/api/imports', files.length > 0 ? [good, ...files] : []);
    expect(res.status).toBe(status);
    expect(res.body.error.code).toBe(code);
    if (files.length > 0 && status !== 413) expect(res.body.error.message).toContain(files[0][0]);
    if (files[0]?.[0] === 'empty.steps') expect(res.body.error.message).toContain('the file is empty');
    if (files[0]?.[0] === 'notes.steps') expect(res.body.error.message).toContain('has no steps');
    expect(await mechanismCount()).toBe(before);
  });

  it('names the path of each wrong field in a JSON file', async () => {
    const res = await upload(owner, '/api/imports/preview', [['other.json', JSON.stringify({ format: 'cyclewright-export', version: 1, mechanisms: [{ title: 'x' }] })]]);
    expect(res.body.error.details.issues.map((i: { path: string[] }) => i.path.join('.'))).toEqual(expect.arrayContaining(['mechanisms.0.source', 'schema']));
  });

  it('rolls back the whole import when a later mechanism breaks a rule (one transaction)', async () => {
    const exported = (await owner.get('/api/exports/mechanisms/hbr/revisions/1?format=json')).body;
    const second = { ...exported.mechanisms[0], title: '   ' };
    const file: Upload = ['two.json', JSON.stringify({ ...exported, mechanisms: [exported.mechanisms[0], second] })];
    const before = await mechanismCount();
    const res = await upload(owner, '/api/imports', [file]);
    expect(res.status).toBe(422);
    expect(res.body.error).toMatchObject({ code: 'IMPORT_INVALID', details: { file: 'two.json', field: 'title' } });
    expect(await mechanismCount()).toBe(before);
  });
});
