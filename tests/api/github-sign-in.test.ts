import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FAKE_GITHUB_IDENTITIES } from '@api/dev/fake-github';
import { csrfAgent } from '../helpers/agent';
import { startTestApp, type TestApp } from '../helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => t.close());

/** Walks the browser's redirects by hand: app → fake provider (choosing an identity) → app callback. */
async function githubRoundTrip(client: Awaited<ReturnType<typeof csrfAgent>>, login: string) {
  const start = await client.get('/auth/github');
  expect(start.status).toBe(302);
  const authorize = new URL(start.headers.location);
  authorize.searchParams.set('login', login);
  const provider = await fetch(authorize, { redirect: 'manual' });
  expect(provider.status).toBe(302);
  const callback = new URL(provider.headers.get('location')!);
  return client.get(callback.pathname + callback.search);
}

describe('GET /auth/github (fake provider)', () => {
  it('creates an author account on first sign-in and finds the same account next time', async () => {
    const who = FAKE_GITHUB_IDENTITIES[0];
    const client = await csrfAgent(t.url);
    const done = await githubRoundTrip(client, who.login);
    expect(done.status).toBe(302);
    expect(done.headers.location).toBe('/');
    const me = await client.get('/api/me');
    expect(me.body).toMatchObject({ email: who.email, githubLogin: who.login, roles: ['author'] });

    const second = await csrfAgent(t.url);
    await githubRoundTrip(second, who.login);
    expect((await second.get('/api/me')).body.id).toBe(me.body.id);
  });

  it('rejects a replayed callback (the OAuth state is used once)', async () => {
    const client = await csrfAgent(t.url);
    const start = await client.get('/auth/github');
    const authorize = new URL(start.headers.location);
    authorize.searchParams.set('login', FAKE_GITHUB_IDENTITIES[1].login);
    const callback = new URL((await fetch(authorize, { redirect: 'manual' })).headers.get('location')!);
    const first = await client.get(callback.pathname + callback.search);
    expect(first.headers.location).toBe('/');
    const stranger = request.agent(t.url);
    const replay = await stranger.get(callback.pathname + callback.search);
    expect(replay.status).toBe(302);
    expect(replay.headers.location).toBe('/sign-in?error=github');
    expect((await stranger.get('/api/me')).status).toBe(401);
  });
});
