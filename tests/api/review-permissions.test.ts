import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { csrfAgent, signedInAgent, type CsrfAgent } from '../helpers/agent';
import { BROMINE_R1, BROMINE_R2, startReviewApp, WHO, type ReviewApp } from './review-helpers';

/** Every route × every role × public/private: who may read, who may act, and 404 where a private mechanism must stay hidden. */
type Role = 'signedOut' | 'owner' | 'otherAuthor' | 'assignedReviewer' | 'unassignedReviewer' | 'curator' | 'instructor' | 'admin';
type Vis = 'public' | 'private';
const ROLES: Role[] = ['signedOut', 'owner', 'otherAuthor', 'assignedReviewer', 'unassignedReviewer', 'curator', 'instructor', 'admin'];
const EMAIL: Record<Exclude<Role, 'signedOut'>, string> = {
  owner: WHO.owner, otherAuthor: WHO.otherAuthor, assignedReviewer: WHO.reviewer, unassignedReviewer: WHO.unassignedReviewer,
  curator: WHO.curator, instructor: WHO.instructor, admin: WHO.admin,
};

const canSee = (role: Role, vis: Vis) =>
  role !== 'signedOut' && (vis === 'public' || ['owner', 'assignedReviewer', 'curator', 'admin'].includes(role));

/** Signed out → 401; allowed → ok; may see but not act → 403; may not see → 404. */
const gate = (allowed: Role[], ok: number) => (role: Role, vis: Vis) => {
  if (role === 'signedOut') return 401;
  if (allowed.includes(role)) return ok;
  return canSee(role, vis) ? 403 : 404;
};
const read = (role: Role, vis: Vis) => (role === 'signedOut' ? 401 : canSee(role, vis) ? 200 : 404);
/** Role-gated routes answer 403 before looking anything up, so they reveal nothing either. */
const roleOnly = (allowed: Role[], ok: number) => (role: Role) => (role === 'signedOut' ? 401 : allowed.includes(role) ? ok : 403);

interface Fixture {
  slug: string;
  roundId: number;
  remarkId: number;
  attachmentId: number;
}

interface RouteCase {
  name: string;
  call: (client: CsrfAgent, f: Fixture) => Promise<{ status: number }>;
  expected: (role: Role, vis: Vis) => number;
}

const upload = (client: CsrfAgent, slug: string) =>
  client.agent.post(`/api/mechanisms/${slug}/attachments`).set('X-CSRF-Token', client.token).attach('file', Buffer.from('T/K,k\n275,1.2e-12\n'), 'rates.csv');

// Withdraw closes the round, so it runs last for each mechanism.
const ROUTES: RouteCase[] = [
  { name: 'GET /api/mechanisms/:slug', call: (c, f) => c.get(`/api/mechanisms/${f.slug}`), expected: read },
  { name: 'PATCH /api/mechanisms/:slug', call: (c, f) => c.patch(`/api/mechanisms/${f.slug}`, { summary: 'Bromine release.' }), expected: gate(['owner'], 200) },
  { name: 'PUT /api/mechanisms/:slug/collaborators', call: (c, f) => c.put(`/api/mechanisms/${f.slug}/collaborators`, { userIds: [] }), expected: gate(['owner'], 200) },
  { name: 'GET /api/mechanisms/:slug/revisions', call: (c, f) => c.get(`/api/mechanisms/${f.slug}/revisions`), expected: read },
  { name: 'GET /api/mechanisms/:slug/revisions/:n', call: (c, f) => c.get(`/api/mechanisms/${f.slug}/revisions/1`), expected: read },
  { name: 'POST /api/mechanisms/:slug/revisions (stale base)', call: (c, f) => c.post(`/api/mechanisms/${f.slug}/revisions`, { base: 1, source: BROMINE_R1 }), expected: gate(['owner'], 409) },
  { name: 'GET /api/mechanisms/:slug/rejected-submissions', call: (c, f) => c.get(`/api/mechanisms/${f.slug}/rejected-submissions`), expected: gate(['owner'], 200) },
  { name: 'GET /api/mechanisms/:slug/compare', call: (c, f) => c.get(`/api/mechanisms/${f.slug}/compare?from=1&to=2`), expected: read },
  { name: 'GET /api/mechanisms/:slug/rounds', call: (c, f) => c.get(`/api/mechanisms/${f.slug}/rounds`), expected: read },
  { name: 'POST /api/mechanisms/:slug/rounds (one in progress)', call: (c, f) => c.post(`/api/mechanisms/${f.slug}/rounds`, {}), expected: gate(['owner'], 409) },
  { name: 'GET /api/mechanisms/:slug/attachments', call: (c, f) => c.get(`/api/mechanisms/${f.slug}/attachments`), expected: read },
  { name: 'POST /api/mechanisms/:slug/attachments', call: (c, f) => upload(c, f.slug), expected: gate(['owner'], 201) },
  { name: 'GET /api/attachments/:id/content', call: (c, f) => c.get(`/api/attachments/${f.attachmentId}/content`), expected: read },
  { name: 'GET /api/rounds/:id', call: (c, f) => c.get(`/api/rounds/${f.roundId}`), expected: read },
  { name: 'GET /api/rounds/:id/remarks', call: (c, f) => c.get(`/api/rounds/${f.roundId}/remarks`), expected: read },
  { name: 'POST /api/rounds/:id/remarks', call: (c, f) => c.post(`/api/rounds/${f.roundId}/remarks`, { step: 'B3', body: 'Which J value?' }), expected: gate(['assignedReviewer', 'curator'], 201) },
  { name: 'POST /api/rounds/:id/verdicts', call: (c, f) => c.post(`/api/rounds/${f.roundId}/verdicts`, { verdict: 'endorse' }), expected: gate(['assignedReviewer'], 200) },
  { name: 'POST /api/rounds/:id/reviewers', call: (c, f) => c.post(`/api/rounds/${f.roundId}/reviewers`, { userId: fixtureReviewerId }), expected: roleOnly(['curator'], 200) },
  { name: 'POST /api/rounds/:id/adopt (not endorsed)', call: (c, f) => c.post(`/api/rounds/${f.roundId}/adopt`), expected: roleOnly(['curator'], 409) },
  { name: 'POST /api/remarks/:id/replies', call: (c, f) => c.post(`/api/remarks/${f.remarkId}/replies`, { body: 'Noted.' }), expected: gate(['owner', 'assignedReviewer', 'curator'], 201) },
  { name: 'POST /api/rounds/:id/withdraw', call: (c, f) => c.post(`/api/rounds/${f.roundId}/withdraw`), expected: gate(['owner'], 200) },
];

let t: ReviewApp;
let fixtureReviewerId: number;
const clients = {} as Record<Role, CsrfAgent>;
const fixtures = {} as Record<Vis, Fixture>;

async function makeFixture(vis: Vis): Promise<Fixture> {
  const owner = clients.owner;
  const created = await owner.post('/api/mechanisms', { title: `Bromine ${vis}`, visibility: vis, tags: ['halogens'], source: BROMINE_R1 });
  const slug = created.body.slug;
  await owner.post(`/api/mechanisms/${slug}/revisions`, { base: 1, source: BROMINE_R2 });
  const attachment = await upload(owner, slug);
  const round = await owner.post(`/api/mechanisms/${slug}/rounds`, {});
  await clients.curator.post(`/api/rounds/${round.body.id}/reviewers`, { userId: fixtureReviewerId });
  const remark = await clients.assignedReviewer.post(`/api/rounds/${round.body.id}/remarks`, { step: 'B1', body: 'Source of the rate?' });
  return { slug, roundId: round.body.id, remarkId: remark.body.id, attachmentId: (attachment as { body: { id: number } }).body.id };
}

beforeAll(async () => {
  t = await startReviewApp();
  fixtureReviewerId = t.ids.get(WHO.reviewer)!;
  clients.signedOut = await csrfAgent(t.url);
  for (const role of ROLES.slice(1) as Array<Exclude<Role, 'signedOut'>>) clients[role] = await signedInAgent(t.url, EMAIL[role]);
  fixtures.public = await makeFixture('public');
  fixtures.private = await makeFixture('private');
});
afterAll(async () => t.close());

const CASES = (['public', 'private'] as Vis[]).flatMap((vis) =>
  ROUTES.flatMap((route) => ROLES.map((role) => ({ route, role, vis, status: route.expected(role, vis) }))),
);

describe('per-mechanism routes', () => {
  it.each(CASES.map((c) => [c.route.name, c.vis, c.role, c.status, c] as const))('%s on a %s mechanism as %s → %i', async (_n, vis, role, status, c) => {
    const res = await c.route.call(clients[role], fixtures[vis]);
    expect(res.status).toBe(status);
  });
});

const LIST_ROUTES: Array<{ name: string; path: string; expected: (role: Role) => number }> = [
  { name: 'list', path: '/api/mechanisms', expected: roleOnly(ROLES.slice(1), 200) },
  { name: 'full-text search', path: '/api/mechanisms?q=bromine', expected: roleOnly(ROLES.slice(1), 200) },
  { name: 'species search', path: `/api/mechanisms?species=${encodeURIComponent('BrO•')}`, expected: roleOnly(ROLES.slice(1), 200) },
  { name: 'queue counts', path: '/api/queues', expected: roleOnly(ROLES.slice(1), 200) },
  { name: 'my reviews', path: '/api/queues/my-reviews', expected: roleOnly(ROLES.slice(1), 200) },
  { name: 'to adopt', path: '/api/queues/to-adopt', expected: roleOnly(['curator'], 200) },
  { name: 'notifications', path: '/api/notifications', expected: roleOnly(ROLES.slice(1), 200) },
  { name: 'dev inbox', path: '/api/dev/inbox', expected: roleOnly(['admin'], 200) },
  { name: 'people', path: '/api/people?role=reviewer', expected: roleOnly(ROLES.slice(1), 200) },
];

describe('lists, search, queues, notifications and the inbox', () => {
  it.each(LIST_ROUTES.flatMap((r) => ROLES.map((role) => [r.name, role, r.expected(role), r.path] as const)))('GET %s as %s → %i', async (_n, role, status, path) => {
    expect((await clients[role].get(path)).status).toBe(status);
  });

  it.each(ROLES.slice(1).flatMap((role) => ['/api/mechanisms', '/api/mechanisms?q=bromine', `/api/mechanisms?species=${encodeURIComponent('BrO•')}`].map((path) => [path, role] as const)))(
    '%s as %s shows the private mechanism only to those who may see it',
    async (path, role) => {
      const slugs = (await clients[role].get(path)).body.items.map((m: { slug: string }) => m.slug);
      expect(slugs).toContain(fixtures.public.slug);
      expect(slugs.includes(fixtures.private.slug)).toBe(canSee(role, 'private'));
    },
  );

  it.each(['owner', 'otherAuthor'] as Role[])('POST /api/mechanisms lets an author (%s) create', async (role) => {
    const res = await clients[role].post('/api/mechanisms', { title: `Iodide peroxide ${role}`, source: 'I1: H2O2 + I^- -> H2O + IO^-\n' });
    expect(res.status).toBe(201);
  });

  it.each(['signedOut', 'assignedReviewer', 'unassignedReviewer', 'curator', 'instructor', 'admin'] as Role[])('POST /api/mechanisms refuses %s', async (role) => {
    const res = await clients[role].post('/api/mechanisms', { title: 'Not mine to write', source: 'X1: O3 -> O2 + O(3P)\n' });
    expect(res.status).toBe(role === 'signedOut' ? 401 : 403);
  });
});
