import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signedInAgent, type CsrfAgent } from '../helpers/agent';
import { BROMINE_R1, BROMINE_R2, startReviewApp, waitFor, WHO, type ReviewApp } from './review-helpers';

let t: ReviewApp;
let owner: CsrfAgent;
let kofi: CsrfAgent;
let mei: CsrfAgent;
let curator: CsrfAgent;
let admin: CsrfAgent;

beforeAll(async () => {
  t = await startReviewApp();
  [owner, kofi, mei, curator, admin] = await Promise.all(
    [WHO.owner, WHO.reviewer, WHO.secondReviewer, WHO.curator, WHO.admin].map((email) => signedInAgent(t.url, email)),
  );
});
afterAll(async () => t.close());

describe('the review journey: r1 → round → reviewers → remarks → r2 → endorsements → adoption', () => {
  const state: { roundId?: number; remarkOnB2?: number; remarkOnB5?: number } = {};

  it('lets the author write r1 and open a review round', async () => {
    const created = await owner.post('/api/mechanisms', {
      title: 'Salt-lake bromine cycle', summary: 'Bromine release over the salt lake; *ozone loss* at polar sunrise.',
      tags: ['halogens', 'field-station'], source: BROMINE_R1, changeNote: 'first draft',
    });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ slug: 'salt-lake-bromine-cycle', latestRevisionNumber: 1, referenceRevision: null });
    const round = await owner.post('/api/mechanisms/salt-lake-bromine-cycle/rounds', {});
    expect(round.status).toBe(201);
    expect(round.body).toMatchObject({ state: 'open', revision: 1, endorsementsNeeded: 2, endorsements: 0 });
    state.roundId = round.body.id;
  });

  it('lets the curator assign two reviewers, and refuses the author as a reviewer', async () => {
    for (const email of [WHO.reviewer, WHO.secondReviewer]) {
      const res = await curator.post(`/api/rounds/${state.roundId}/reviewers`, { userId: t.ids.get(email) });
      expect(res.status).toBe(200);
    }
    const own = await curator.post(`/api/rounds/${state.roundId}/reviewers`, { userId: t.ids.get(WHO.owner) });
    expect(own.status).toBe(422); // Rosalind holds no reviewer role; the own-mechanism rule is checked in the matrix
    const round = await kofi.get(`/api/rounds/${state.roundId}`);
    expect(round.body.reviewers.map((r: { name: string }) => r.name)).toEqual(['Kofi Glasswort', 'Mei Tidewell']);
    expect((await kofi.get('/api/queues')).body).toEqual({ myReviews: 1, toAdopt: null });
  });

  it('takes remarks anchored to steps, and a verdict asking for revision', async () => {
    const onB2 = await kofi.post(`/api/rounds/${state.roundId}/remarks`, { step: 'B2', body: 'Is the **BrO self-reaction** channel to Br2 + O2 left out on purpose?' });
    expect(onB2.status).toBe(201);
    expect(onB2.body).toMatchObject({ revision: 1, stepLabel: 'B2', stepLine: 5, matching: true, replies: [] });
    expect(onB2.body.bodyHtml).toContain('<strong>BrO self-reaction</strong>');
    const onB5 = await mei.post(`/api/rounds/${state.roundId}/remarks`, { step: 'B5', body: 'Br2 photolysis needs a source of Br2.' });
    expect(onB5.status).toBe(201);
    Object.assign(state, { remarkOnB2: onB2.body.id, remarkOnB5: onB5.body.id });
    const reply = await owner.post(`/api/remarks/${onB2.body.id}/replies`, { body: 'Yes: it is minor at 275 K.' });
    expect(reply.status).toBe(201);
    const revise = await kofi.post(`/api/rounds/${state.roundId}/verdicts`, { verdict: 'revise', comment: 'Please update the B1 rate.' });
    expect(revise.body.state).toBe('revise-requested');
  });

  it('moves the remarks to r2 when the author posts it: B2 follows, B5 is no longer matching', async () => {
    const r2 = await owner.post('/api/mechanisms/salt-lake-bromine-cycle/revisions', { base: 1, source: BROMINE_R2, changeNote: 'new B1 rate; B5 dropped' });
    expect(r2.status).toBe(201);
    expect(r2.body.number).toBe(2);
    const round = await owner.get(`/api/rounds/${state.roundId}`);
    expect(round.body).toMatchObject({ state: 'open', revision: 2, endorsements: 0 });
    const remarks = (await owner.get(`/api/rounds/${state.roundId}/remarks`)).body;
    const b2 = remarks.find((r: { id: number }) => r.id === state.remarkOnB2);
    const b5 = remarks.find((r: { id: number }) => r.id === state.remarkOnB5);
    expect(b2).toMatchObject({ revision: 2, stepLabel: 'B2', stepLine: 6, matching: true, originalRevision: 1, originalLine: 5 });
    expect(b2.replies).toHaveLength(1);
    expect(b5).toMatchObject({ revision: 1, matching: false, originalLabel: 'B5', originalLine: 8 });
    expect(b5.originalContext).toContain('B5: Br2 + hν -> 2 Br•');
  });

  it('becomes endorsed after two endorsements, then the curator adopts r2 as the reference revision', async () => {
    const first = await kofi.post(`/api/rounds/${state.roundId}/verdicts`, { verdict: 'endorse' });
    expect(first.body).toMatchObject({ state: 'open', endorsements: 1 });
    const second = await mei.post(`/api/rounds/${state.roundId}/verdicts`, { verdict: 'endorse', comment: 'Balanced and consistent.' });
    expect(second.body).toMatchObject({ state: 'endorsed', endorsements: 2 });
    expect((await curator.get('/api/queues')).body.toAdopt).toBe(1);
    const adopted = await curator.post(`/api/rounds/${state.roundId}/adopt`);
    expect(adopted.body.state).toBe('adopted');
    expect((await owner.get('/api/mechanisms/salt-lake-bromine-cycle')).body.referenceRevision).toBe(2);
    const late = await kofi.post(`/api/rounds/${state.roundId}/verdicts`, { verdict: 'decline', comment: 'Too late.' });
    expect(late.status).toBe(409);
    expect(late.body.error.code).toBe('INVALID_STATE');
  });

  it('recorded every state change in the audit log', async () => {
    const roundLog = await t.db('audit_log').where({ subject_type: 'review_round', subject_id: String(state.roundId) }).orderBy('id').pluck('action');
    expect(roundLog).toEqual([
      'round.opened', 'round.reviewer-assigned', 'round.reviewer-assigned', 'remark.created', 'remark.created',
      'remark.replied', 'verdict.given', 'round.state-changed', 'round.revision-entered', 'round.state-changed',
      'remarks.followed', 'verdict.given', 'verdict.given', 'round.state-changed', 'round.state-changed',
    ]);
    const transitions = await t.db('audit_log').where({ action: 'round.state-changed', subject_id: String(state.roundId) }).orderBy('id').pluck('details');
    expect(transitions.map((d: { from: string; to: string }) => `${d.from}→${d.to}`)).toEqual([
      'open→revise-requested', 'revise-requested→open', 'open→endorsed', 'endorsed→adopted',
    ]);
    const mechanismLog = await t.db('audit_log').where({ subject_type: 'mechanism' }).orderBy('id').pluck('action');
    expect(mechanismLog).toEqual(['mechanism.created', 'revision.created', 'revision.created', 'mechanism.reference-set']);
  });

  it('sent every message through the fake SMTP server, listed in the admin inbox', async () => {
    await waitFor(() => t.smtp.messages.length >= 8, 'eight messages');
    const inbox = await admin.get('/api/dev/inbox');
    expect(inbox.status).toBe(200);
    const seen = inbox.body.map((m: { to: string[]; subject: string }) => `${m.to.join(',')} | ${m.subject}`).sort();
    const title = '"Salt-lake bromine cycle"';
    expect(seen).toEqual([
      `${WHO.reviewer} | Review requested: ${title} r1`,
      `${WHO.secondReviewer} | Review requested: ${title} r1`,
      `${WHO.owner} | New remark on ${title} r1, step B2`,
      `${WHO.owner} | New remark on ${title} r1, step B5`,
      `${WHO.owner} | Verdict on ${title} r1: revise`,
      `${WHO.owner} | Verdict on ${title} r2: endorse`,
      `${WHO.owner} | Verdict on ${title} r2: endorse`,
      `${WHO.owner} | Adopted: ${title} r2 is now the reference revision`,
    ].sort());
    const outbox = await t.db('mail_outbox').pluck('status');
    expect(outbox.every((status: string) => status === 'sent')).toBe(true);
  });
});
