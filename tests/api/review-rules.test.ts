import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, type CsrfAgent } from '../helpers/agent';
import { BROMINE_R1, BROMINE_R2, startReviewApp, WHO, type ReviewApp } from './review-helpers';

let t: ReviewApp;
let owner: CsrfAgent;
let collaborator: CsrfAgent;
let kofi: CsrfAgent;
let mei: CsrfAgent;
let curator: CsrfAgent;

async function mechanismWithRound(title: string, by = owner) {
  const { slug } = (await by.post('/api/mechanisms', { title, source: BROMINE_R1 })).body;
  const round = (await by.post(`/api/mechanisms/${slug}/rounds`, {})).body;
  await curator.post(`/api/rounds/${round.id}/reviewers`, { userId: t.ids.get(WHO.reviewer) });
  return { slug, roundId: round.id as number };
}

const upload = (client: CsrfAgent, slug: string, content: Buffer, filename: string, contentType?: string) =>
  client.agent.post(`/api/mechanisms/${slug}/attachments`).set('X-CSRF-Token', client.token)
    .attach('file', content, contentType ? { filename, contentType } : filename);

beforeAll(async () => {
  t = await startReviewApp({ maxAttachmentBytes: 1024 });
  [owner, collaborator, kofi, mei, curator] = await Promise.all(
    [WHO.owner, WHO.otherAuthor, WHO.reviewer, WHO.secondReviewer, WHO.curator].map((email) => signedInAgent(t.url, email)),
  );
});
afterAll(async () => t.close());

describe('POST /api/mechanisms/:slug/revisions', () => {
  it('answers one of two saves on the same base with 201 and the other with 409, and keeps both texts', async () => {
    const { slug } = (await owner.post('/api/mechanisms', { title: 'Race on r1', source: BROMINE_R1 })).body;
    await owner.put(`/api/mechanisms/${slug}/collaborators`, { userIds: [t.ids.get(WHO.otherAuthor)] });
    const texts = [BROMINE_R2, `${BROMINE_R1}B6: BrO• + O3 -> Br• + 2 O2\n`];
    const results = await Promise.all([
      owner.post(`/api/mechanisms/${slug}/revisions`, { base: 1, source: texts[0], changeNote: 'owner' }),
      collaborator.post(`/api/mechanisms/${slug}/revisions`, { base: 1, source: texts[1], changeNote: 'collaborator' }),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual([201, 409]);
    const winner = results.find((r) => r.status === 201)!;
    const loser = results.find((r) => r.status === 409)!;
    const winnerText = texts[results.indexOf(winner)];
    const loserText = texts[results.indexOf(loser)];
    expect(loser.body.error.code).toBe('CONFLICT');
    expect(loser.body.error.details.latest).toMatchObject({ number: 2, source: winnerText });
    expect(loser.body.error.details.yours).toMatchObject({ base: 1, source: loserText });
    expect((await owner.get(`/api/mechanisms/${slug}/revisions/2`)).body.source).toBe(winnerText);
    const rejected = (await collaborator.get(`/api/mechanisms/${slug}/rejected-submissions`)).body;
    expect(rejected).toEqual([expect.objectContaining({ baseNumber: 1, latestNumber: 2, source: loserText })]);
    expect((await owner.get(`/api/mechanisms/${slug}/revisions`)).body.map((r: { number: number }) => r.number)).toEqual([1, 2]);
    const audit = await t.db('audit_log').where({ subject_type: 'mechanism', action: 'revision.rejected-stale' }).pluck('details');
    expect(audit).toEqual([{ rejectedSubmissionId: rejected[0].id, base: 1, latest: 2 }]);
  });

  it('lets only one of two racing requests take a slug or open a round', async () => {
    const body = { title: 'Same address', source: BROMINE_R1 };
    const created = await Promise.all([owner.post('/api/mechanisms', body), collaborator.post('/api/mechanisms', body)]);
    expect(created.map((r) => r.status).sort()).toEqual([201, 409]);
    const winner = created.find((r) => r.status === 201)!.body;
    const client = winner.owner.id === t.ids.get(WHO.owner) ? owner : collaborator;
    const opened = await Promise.all([1, 2].map(() => client.post(`/api/mechanisms/${winner.slug}/rounds`, {})));
    expect(opened.map((r) => r.status).sort()).toEqual([201, 409]);
  });

  it('answers 404 for a base that does not exist and 400 without a base', async () => {
    const { slug } = (await owner.post('/api/mechanisms', { title: 'No such base', source: BROMINE_R1 })).body;
    expect((await owner.post(`/api/mechanisms/${slug}/revisions`, { base: 7, source: BROMINE_R2 })).status).toBe(404);
    const missing = await owner.post(`/api/mechanisms/${slug}/revisions`, { source: BROMINE_R2 });
    expect(missing.status).toBe(400);
    expect(missing.body.error.details[0].path).toEqual(['base']);
  });
});

describe('attachments', () => {
  let slug: string;
  beforeAll(async () => {
    slug = (await owner.post('/api/mechanisms', { title: 'Attachments', source: BROMINE_R1 })).body.slug;
  });

  it('refuses an upload over the size limit with 413, an empty one and a missing one with 400', async () => {
    const big = await upload(owner, slug, Buffer.alloc(2048, 65), 'big.txt');
    expect([big.status, big.body.error.code]).toEqual([413, 'FILE_TOO_LARGE']);
    const empty = await upload(owner, slug, Buffer.alloc(0), 'empty.txt');
    expect([empty.status, empty.body.error.code]).toEqual([400, 'UPLOAD_EMPTY']);
    const none = await owner.agent.post(`/api/mechanisms/${slug}/attachments`).set('X-CSRF-Token', owner.token).field('note', 'x');
    expect([none.status, none.body.error.code]).toEqual([400, 'UPLOAD_MISSING']);
  });

  it('stores the SHA-256 and the type its bytes show, whatever the client claims', async () => {
    // FIPS 180-2, appendix B.1: SHA-256("abc").
    const abc = await upload(owner, slug, Buffer.from('abc'), 'abc.png', 'image/png');
    expect(abc.body).toMatchObject({ size: 3, mediaType: 'text/plain; charset=utf-8', sha256: 'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad' });
    // PNG signature, ISO/IEC 15948 §5.2: 89 50 4E 47 0D 0A 1A 0A, then the IHDR chunk header.
    const pngBytes = Buffer.from('89504e470d0a1a0a0000000d49484452000000010000000108060000001f15c489', 'hex');
    const png = await upload(owner, slug, pngBytes, 'notes.txt', 'text/plain');
    expect(png.body.mediaType).toBe('image/png');
    const download = await owner.get(`/api/attachments/${png.body.id}/content`).buffer(true).parse((res, done) => {
      const chunks: Buffer[] = [];
      res.on('data', (chunk: Buffer) => chunks.push(chunk));
      res.on('end', () => done(null, Buffer.concat(chunks)));
    });
    expect(download.headers['content-type']).toBe('image/png');
    expect(download.headers['x-content-type-options']).toBe('nosniff');
    expect(download.headers['content-disposition']).toContain('attachment');
    expect(Buffer.compare(download.body, pngBytes)).toBe(0);
  });
});

describe('unknown and malformed ids', () => {
  it.each([
    ['/api/mechanisms/no-such-mechanism', 404],
    ['/api/mechanisms/no-such-mechanism/revisions', 404],
    ['/api/rounds/999999', 404],
    ['/api/rounds/999999/remarks', 404],
    ['/api/attachments/999999/content', 404],
    ['/api/rounds/abc', 400],
    ['/api/attachments/-1/content', 400],
  ])('GET %s → %i', async (path, status) => {
    expect((await owner.get(path)).status).toBe(status);
  });

  it('answers 404 for a revision or comparison with an unknown number', async () => {
    const { slug } = (await owner.post('/api/mechanisms', { title: 'Unknown numbers', source: BROMINE_R1 })).body;
    expect((await owner.get(`/api/mechanisms/${slug}/revisions/9`)).status).toBe(404);
    expect((await owner.get(`/api/mechanisms/${slug}/compare?from=1&to=9`)).status).toBe(404);
    expect((await owner.get(`/api/mechanisms/${slug}/compare?from=1`)).status).toBe(400);
    expect((await owner.post('/api/remarks/999999/replies', { body: 'hello' })).status).toBe(404);
    expect((await owner.post('/api/remarks/999999/settle')).status).toBe(404);
  });
});

describe('round states', () => {
  it('refuses verdicts, remarks and adoption on a round in the wrong state', async () => {
    const { slug, roundId } = await mechanismWithRound('Wrong states');
    expect((await curator.post(`/api/rounds/${roundId}/adopt`)).body.error.code).toBe('INVALID_STATE');
    expect((await owner.post(`/api/mechanisms/${slug}/rounds`, {})).status).toBe(409);
    expect((await owner.post(`/api/rounds/${roundId}/withdraw`)).body.state).toBe('withdrawn');
    const verdict = await kofi.post(`/api/rounds/${roundId}/verdicts`, { verdict: 'endorse' });
    expect([verdict.status, verdict.body.error.code]).toEqual([409, 'INVALID_STATE']);
    expect((await kofi.post(`/api/rounds/${roundId}/remarks`, { step: 'B1', body: 'late' })).status).toBe(409);
    expect((await owner.post(`/api/rounds/${roundId}/withdraw`)).status).toBe(409);
    expect((await owner.post(`/api/mechanisms/${slug}/rounds`, {})).status).toBe(201);
  });

  it('closes a round on a decline, and needs a comment for revise and decline', async () => {
    const { roundId } = await mechanismWithRound('Declined');
    const bare = await kofi.post(`/api/rounds/${roundId}/verdicts`, { verdict: 'decline' });
    expect(bare.status).toBe(400);
    expect(bare.body.error.details[0].path).toEqual(['comment']);
    const declined = await kofi.post(`/api/rounds/${roundId}/verdicts`, { verdict: 'decline', comment: 'B2 products are wrong.' });
    expect(declined.body.state).toBe('declined');
  });

  it('keeps authors from reviewing their own mechanism', async () => {
    const { slug, roundId } = await mechanismWithRound('Mei writes this', mei);
    const own = await curator.post(`/api/rounds/${roundId}/reviewers`, { userId: t.ids.get(WHO.secondReviewer) });
    expect([own.status, own.body.error.code]).toEqual([409, 'OWN_MECHANISM']);
    await mei.put(`/api/mechanisms/${slug}/collaborators`, { userIds: [t.ids.get(WHO.reviewer)] });
    const verdict = await kofi.post(`/api/rounds/${roundId}/verdicts`, { verdict: 'endorse' });
    expect(verdict.status).toBe(403);
  });

  it('lets the remark author or the mechanism authors settle a remark, once', async () => {
    const { roundId } = await mechanismWithRound('Settling');
    const remark = (await kofi.post(`/api/rounds/${roundId}/remarks`, { step: '#2', body: 'Check B2.' })).body;
    expect(remark.stepLabel).toBe('B2');
    expect((await mei.post(`/api/remarks/${remark.id}/settle`)).status).toBe(403);
    expect((await owner.post(`/api/remarks/${remark.id}/settle`)).status).toBe(204);
    expect((await kofi.post(`/api/remarks/${remark.id}/settle`)).status).toBe(409);
  });
});
