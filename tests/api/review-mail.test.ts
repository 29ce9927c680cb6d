import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { deliverOutbox } from '@api/mail/deliver-outbox';
import { startFakeSmtp } from '@api/mail/fake-smtp';
import { createMailTransport } from '@api/mail/mail-transport';
import { seedPeople } from '@api/seed/seed-people';
import { signedInAgent, type CsrfAgent } from '../helpers/agent';
import { startTestApp } from '../helpers/test-app';
import { BROMINE_R1, BROMINE_R2, startReviewApp, waitFor, WHO, type ReviewApp } from './review-helpers';

describe('notifications and e-mail', () => {
  let t: ReviewApp;
  let owner: CsrfAgent;
  let tarn: CsrfAgent;
  let kofi: CsrfAgent;
  let curator: CsrfAgent;

  beforeAll(async () => {
    t = await startReviewApp({ endorsementsNeeded: 1 });
    [owner, tarn, kofi, curator] = await Promise.all(
      [WHO.owner, WHO.otherAuthor, WHO.reviewer, WHO.curator].map((email) => signedInAgent(t.url, email)),
    );
  });
  afterAll(async () => t.close());

  async function roundOn(title: string) {
    const { slug } = (await owner.post('/api/mechanisms', { title, source: BROMINE_R1 })).body;
    const round = (await owner.post(`/api/mechanisms/${slug}/rounds`, {})).body;
    await curator.post(`/api/rounds/${round.id}/reviewers`, { userId: t.ids.get(WHO.reviewer) });
    return { slug, roundId: round.id as number };
  }

  const outboxFor = (email: string, kind: string) => t.db('mail_outbox').where({ to_address: email, kind }).pluck('subject');

  it('lets a person turn a kind of e-mail off; the in-app notification still arrives', async () => {
    const me = await owner.patch('/api/me', { mailPreferences: { remark: false } });
    expect(me.body.mailPreferences).toEqual({ remark: false });
    const { roundId } = await roundOn('Quiet remarks');
    await kofi.post(`/api/rounds/${roundId}/remarks`, { step: 'B1', body: 'Which evaluation?' });
    await kofi.post(`/api/rounds/${roundId}/verdicts`, { verdict: 'revise', comment: 'Cite the rate.' });
    expect(await outboxFor(WHO.owner, 'remark')).toEqual([]);
    expect(await outboxFor(WHO.owner, 'verdict')).toEqual(['Verdict on "Quiet remarks" r1: revise']);
    const kinds = (await owner.get('/api/notifications')).body.map((n: { kind: string }) => n.kind);
    expect(kinds).toEqual(['verdict', 'remark']);
    await owner.patch('/api/me', { mailPreferences: {} });
  });

  it('tells nobody about a private mechanism they can no longer see, in the app or by mail', async () => {
    const { slug, roundId } = await roundOn('Private after all');
    await owner.put(`/api/mechanisms/${slug}/collaborators`, { userIds: [t.ids.get(WHO.otherAuthor)] });
    expect((await tarn.post(`/api/mechanisms/${slug}/revisions`, { base: 1, source: BROMINE_R2 })).status).toBe(201);
    await kofi.post(`/api/rounds/${roundId}/remarks`, { step: 'B2', body: 'Fine.' });
    const before = (await tarn.get('/api/notifications')).body.filter((n: { mechanismSlug: string }) => n.mechanismSlug === slug);
    expect(before.map((n: { kind: string }) => n.kind)).toEqual(['remark']);

    await owner.put(`/api/mechanisms/${slug}/collaborators`, { userIds: [] });
    await owner.patch(`/api/mechanisms/${slug}`, { visibility: 'private' });
    expect((await tarn.get('/api/notifications')).body.filter((n: { mechanismSlug: string }) => n.mechanismSlug === slug)).toEqual([]);
    expect((await tarn.get(`/api/mechanisms/${slug}`)).status).toBe(404);

    expect((await kofi.post(`/api/rounds/${roundId}/verdicts`, { verdict: 'endorse' })).body.state).toBe('endorsed');
    expect((await curator.post(`/api/rounds/${roundId}/adopt`)).body.state).toBe('adopted');
    // Tarn wrote r2, which was adopted, but may no longer see the mechanism.
    expect(await outboxFor(WHO.otherAuthor, 'adopted')).toEqual([]);
    expect(await outboxFor(WHO.owner, 'adopted')).toEqual(['Adopted: "Private after all" r2 is now the reference revision']);
    await waitFor(() => t.smtp.messages.some((m) => m.subject.startsWith('Adopted: "Private after all"')), 'the adoption mail');
    expect(t.smtp.messages.filter((m) => m.to.includes(WHO.otherAuthor) && m.subject.includes('Private after all'))).toHaveLength(1);
  });

  it('marks a notification read, and only the addressee may', async () => {
    const [first] = (await owner.get('/api/notifications?unread=true')).body;
    expect((await kofi.post(`/api/notifications/${first.id}/read`)).status).toBe(404);
    expect((await owner.post(`/api/notifications/${first.id}/read`)).status).toBe(204);
    const unread = (await owner.get('/api/notifications?unread=true')).body.map((n: { id: number }) => n.id);
    expect(unread).not.toContain(first.id);
  });
});

describe('GET /api/dev/inbox without a fake mail server', () => {
  it('answers 404 to an admin where no fake SMTP server runs (production)', async () => {
    const t = await startTestApp();
    try {
      await seedPeople(t.db);
      const res = await (await signedInAgent(t.url, WHO.admin)).get('/api/dev/inbox');
      expect([res.status, res.body.error.code]).toEqual([404, 'NOT_FOUND']);
    } finally {
      await t.close();
    }
  });
});

describe('when the SMTP server is down', () => {
  let t: ReviewApp;

  beforeAll(async () => {
    const gone = await startFakeSmtp();
    await gone.close();
    t = await startReviewApp({ mailTransport: createMailTransport({ host: '127.0.0.1', port: gone.port, from: 'test@example.test' }) });
  });
  afterAll(async () => t.close());

  it('keeps the state change, leaves the message in the outbox, and delivers it on a later attempt', async () => {
    const [owner, curator] = await Promise.all([WHO.owner, WHO.curator].map((email) => signedInAgent(t.url, email)));
    const { slug } = (await owner.post('/api/mechanisms', { title: 'Mail outage', source: BROMINE_R1 })).body;
    const round = (await owner.post(`/api/mechanisms/${slug}/rounds`, {})).body;
    const assigned = await curator.post(`/api/rounds/${round.id}/reviewers`, { userId: t.ids.get(WHO.reviewer) });
    expect(assigned.status).toBe(200);
    await waitFor(async () => (await t.db('mail_outbox').first('attempts')).attempts >= 1, 'a failed attempt');
    const failed = await t.db('mail_outbox').first('status', 'last_error', 'to_address');
    expect(failed).toMatchObject({ status: 'pending', to_address: WHO.reviewer });
    expect(failed.last_error).toMatch(/ECONNREFUSED/);
    expect((await t.db('round_reviewers').where({ round_id: round.id })).length).toBe(1);

    await t.db('mail_outbox').update({ next_attempt_at: t.db.fn.now() });
    const smtp = await startFakeSmtp();
    const transport = createMailTransport({ host: '127.0.0.1', port: smtp.port, from: 'test@example.test' });
    try {
      expect(await deliverOutbox(t.db, transport)).toBe(1);
      expect(smtp.messages.map((m) => m.subject)).toEqual(['Review requested: "Mail outage" r1']);
      expect((await t.db('mail_outbox').first('status')).status).toBe('sent');
    } finally {
      transport.close();
      await smtp.close();
    }
  });
});
