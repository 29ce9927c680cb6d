import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '@api/app';
import { DEMO_PEOPLE } from '@api/seed/demo-people';
import { seedPeople } from '@api/seed/seed-people';
import { signedInAgent } from '../helpers/agent';
import { startTestApp, type TestApp } from '../helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp({ authRateLimit: { windowMs: 60_000, limit: 3 } });
  await seedPeople(t.db);
});
afterAll(async () => t.close());

describe('sessions stored in PostgreSQL', () => {
  it('survive a restart: a second app on the same database accepts the cookie', async () => {
    const person = DEMO_PEOPLE[0];
    const client = await signedInAgent(t.url, person.email);
    const cookie = (await client.get('/api/me')).request.cookies;
    const rows = await t.db('session').count<{ count: number }[]>('* as count');
    expect(rows[0].count).toBeGreaterThan(0);
    const restarted = createApp({ db: t.db, config: t.config });
    try {
      const res = await request(restarted).get('/api/me').set('Cookie', cookie);
      expect(res.status).toBe(200);
      expect(res.body.email).toBe(person.email);
    } finally {
      await restarted.closeResources();
    }
  });
});

describe('rate limit on sign-in', () => {
  it('answers 429 RATE_LIMITED after the configured number of attempts for one address and e-mail', async () => {
    const email = DEMO_PEOPLE[1].email;
    const client = await signedInAgent(t.url, DEMO_PEOPLE[2].email);
    const statuses: number[] = [];
    for (let i = 0; i < 4; i += 1) {
      statuses.push((await client.post('/api/auth/sign-in', { email, password: 'not-the-password-9' })).status);
    }
    expect(statuses).toEqual([401, 401, 401, 429]);
  });
});
