import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD, DEMO_PEOPLE } from '@api/seed/demo-people';
import { seedPeople } from '@api/seed/seed-people';
import { csrfAgent, signedInAgent } from '../helpers/agent';
import { startTestApp, type TestApp } from '../helpers/test-app';

let t: TestApp;
const author = DEMO_PEOPLE.find((p) => p.roles.includes('author'))!;

beforeAll(async () => {
  t = await startTestApp();
  await seedPeople(t.db);
});
afterAll(async () => t.close());

const sessionCookie = (res: { headers: Record<string, unknown> }) =>
  ([] as string[]).concat((res.headers['set-cookie'] as string[]) ?? []).find((c) => c.startsWith('cyclewright.sid='));

describe('GET /api/session', () => {
  it('answers a signed-out visitor with no user and a CSRF token', async () => {
    const client = await csrfAgent(t.url);
    const res = await client.get('/api/session');
    expect(res.status).toBe(200);
    expect(res.body.user).toBeNull();
    expect(res.body.csrfToken).toMatch(/^[\w-]{20,}$/);
  });
});

describe('POST /api/auth/sign-up', () => {
  describe('when the body is invalid', () => {
    it('responds 400 with VALIDATION_FAILED naming each field', async () => {
      const client = await csrfAgent(t.url);
      const res = await client.post('/api/auth/sign-up', { name: '', email: 'not-an-address', password: 'short' });
      expect(res.status).toBe(400);
      expect(res.body.error.code).toBe('VALIDATION_FAILED');
      const fields = res.body.error.details.map((d: { path: string[] }) => d.path[0]);
      expect(fields).toEqual(expect.arrayContaining(['name', 'email', 'password']));
    });

    it('rejects a long password made of one kind of character', async () => {
      const client = await csrfAgent(t.url);
      const res = await client.post('/api/auth/sign-up', { name: 'Lee Creek', email: 'lee.creek@example.test', password: 'aaaaaaaaaaaaaa' });
      expect(res.status).toBe(400);
      expect(res.body.error.details[0].path).toEqual(['password']);
    });
  });

  it('creates an author account, signs it in and refuses the same e-mail twice', async () => {
    const client = await csrfAgent(t.url);
    const body = { name: 'Lee Creek', email: 'Lee.Creek@example.test', password: 'mudflat-2026-tide' };
    const res = await client.post('/api/auth/sign-up', body);
    expect(res.status).toBe(201);
    expect(res.body.user).toMatchObject({ name: 'Lee Creek', email: 'lee.creek@example.test', roles: ['author'] });
    expect(res.body.user.passwordHash).toBeUndefined();
    client.setToken(res.body.csrfToken);
    expect((await client.get('/api/me')).body.email).toBe('lee.creek@example.test');
    const again = await (await csrfAgent(t.url)).post('/api/auth/sign-up', { ...body, email: 'lee.creek@EXAMPLE.test' });
    expect(again.status).toBe(409);
  });
});

describe('POST /api/auth/sign-in', () => {
  it('responds 401 INVALID_CREDENTIALS for a wrong password and for an unknown e-mail alike', async () => {
    const client = await csrfAgent(t.url);
    const wrong = await client.post('/api/auth/sign-in', { email: author.email, password: 'wrong-password-1' });
    const unknown = await client.post('/api/auth/sign-in', { email: 'nobody@example.test', password: 'wrong-password-1' });
    expect([wrong.status, unknown.status]).toEqual([401, 401]);
    expect(wrong.body.error.code).toBe('INVALID_CREDENTIALS');
    expect(unknown.body.error.message).toBe(wrong.body.error.message);
  });

  it('signs in on a new session id and hands out a new CSRF token', async () => {
    const client = await csrfAgent(t.url);
    const before = sessionCookie(await client.get('/api/session'));
    const res = await client.post('/api/auth/sign-in', { email: author.email, password: DEMO_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.user.roles).toEqual(author.roles);
    const after = sessionCookie(res);
    expect(after).toBeDefined();
    expect(after!.split(';')[0]).not.toBe(before?.split(';')[0]);
    expect(after).toMatch(/HttpOnly/i);
    expect(after).toMatch(/SameSite=Lax/i);
  });
});

describe('CSRF protection', () => {
  it('responds 403 CSRF_INVALID to a write without the token or with a wrong one', async () => {
    const client = await signedInAgent(t.url, author.email);
    const missing = await client.agent.patch('/api/me').send({ name: 'X' });
    const wrong = await client.agent.patch('/api/me').set('X-CSRF-Token', 'forged-token-value').send({ name: 'X' });
    expect([missing.status, wrong.status]).toEqual([403, 403]);
    expect(missing.body.error.code).toBe('CSRF_INVALID');
    const right = await client.patch('/api/me', { name: author.name });
    expect(right.status).toBe(200);
  });
});

describe('POST /api/auth/sign-out', () => {
  it('ends the session: /api/me then answers 401', async () => {
    const client = await signedInAgent(t.url, author.email);
    expect((await client.get('/api/me')).status).toBe(200);
    expect((await client.post('/api/auth/sign-out')).status).toBe(204);
    const res = await client.get('/api/me');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('UNAUTHORIZED');
  });
});
