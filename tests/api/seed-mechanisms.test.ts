import { readdirSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedDemo } from '@api/seed/seed-demo';
import { startTestApp, type TestApp } from '../helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => t.close());

describe('seedDemo', () => {
  it('imports every example except the faulty one, opens a round on the bromine cycle, and is idempotent', async () => {
    await seedDemo(t.db);
    await seedDemo(t.db);
    const expected = readdirSync('examples').filter((f) => f.endsWith('.steps') && f !== 'faulty.steps').map((f) => f.replace('.steps', '')).sort();
    expect(await t.db('mechanisms').orderBy('slug').pluck('slug')).toEqual(expected);
    expect(await t.db('revisions').count({ n: '*' }).first()).toEqual({ n: expected.length });
    const rounds = await t.db('review_rounds as r').join('mechanisms as m', 'm.id', 'r.mechanism_id').select('m.slug', 'r.state', 'r.id');
    expect(rounds.map(({ slug, state }) => ({ slug, state }))).toEqual([{ slug: 'salt-lake-bromine', state: 'open' }]);
    const reviewers = await t.db('round_reviewers as rr').join('users as u', 'u.id', 'rr.reviewer_id').where('rr.round_id', rounds[0].id).pluck('u.email');
    expect(reviewers).toEqual(['kofi.glasswort@saltmarsh.example.test']);
    const bromine = await t.db('mechanisms').where({ slug: 'salt-lake-bromine' }).first('title', 'tags');
    expect(bromine).toEqual({ title: 'Salt-lake bromine cycle', tags: ['field-station'] });
  });
});
