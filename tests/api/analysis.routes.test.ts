import { readFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PEOPLE } from '@api/seed/demo-people';
import { seedPeople } from '@api/seed/seed-people';
import { csrfAgent, signedInAgent } from '../helpers/agent';
import { startTestApp, type TestApp } from '../helpers/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
  await seedPeople(t.db);
});
afterAll(async () => t.close());

describe('POST /api/analyse', () => {
  it('answers 401 when signed out', async () => {
    const res = await (await csrfAgent(t.url)).post('/api/analyse', { text: 'NO + O3 -> NO2 + O2' });
    expect(res.status).toBe(401);
  });

  it('returns the same JSON as the check command for a demo example', async () => {
    const client = await signedInAgent(t.url, DEMO_PEOPLE[0].email);
    const text = readFileSync('examples/salt-lake-bromine.steps', 'utf8');
    const golden = JSON.parse(readFileSync('examples/salt-lake-bromine.json', 'utf8'));
    const res = await client.post('/api/analyse', { text });
    expect(res.status).toBe(200);
    for (const field of ['steps', 'species', 'intermediates', 'routes', 'overall', 'diagnostics']) {
      expect(res.body[field]).toEqual(golden[field]);
    }
  });

  // NO + O3 → NO2 + O2 and NO2 + O → NO + O2 sum to O3 + O → 2 O2 with NO as the catalyst
  // (Finlayson-Pitts & Pitts, Chemistry of the Upper and Lower Atmosphere, ch. 12; from memory).
  it('finds the net reaction and the catalyst of the NOx ozone cycle', async () => {
    const client = await signedInAgent(t.url, DEMO_PEOPLE[0].email);
    const res = await client.post('/api/analyse', { text: 'N1: NO + O3 -> NO2 + O2\nN2: NO2 + O(3P) -> NO + O2\n' });
    const productive = res.body.routes.filter((r: { kind: string }) => r.kind === 'productive');
    expect(productive).toHaveLength(1);
    expect(productive[0].netSpecies).toEqual({ O3: -1, 'O(3P)': -1, O2: 2 });
    const roles = Object.fromEntries(res.body.species.map((s: { key: string; role: string }) => [s.key, s.role]));
    expect(roles['NO•'] ?? roles.NO).toBe('catalyst');
  });

  it('responds 400 naming the field when text is missing or too long', async () => {
    const client = await signedInAgent(t.url, DEMO_PEOPLE[0].email);
    const missing = await client.post('/api/analyse', {});
    expect(missing.status).toBe(400);
    expect(missing.body.error.details[0].path).toEqual(['text']);
  });
});

describe('POST /api/analyse rate limit', () => {
  it('allows 600 analyses a minute per person (typing with a 120 ms pause), then answers 429 RATE_LIMITED', async () => {
    const client = await signedInAgent(t.url, DEMO_PEOPLE[1].email);
    const statuses: number[] = [];
    for (let batch = 0; batch < 12; batch += 1) {
      const answers = await Promise.all(Array.from({ length: 50 }, () => client.post('/api/analyse', { text: 'N1: NO + O3 -> NO2 + O2' })));
      statuses.push(...answers.map((res) => res.status));
    }
    expect(statuses.filter((status) => status !== 200)).toEqual([]);
    const over = await client.post('/api/analyse', { text: 'N1: NO + O3 -> NO2 + O2' });
    expect(over.status).toBe(429);
    expect(over.body.error.code).toBe('RATE_LIMITED');
  });
});

describe('POST /api/analyse timing', () => {
  it('names the server’s share of the answer in Server-Timing (analysis, then JSON)', async () => {
    const client = await signedInAgent(t.url, DEMO_PEOPLE[0].email);
    const res = await client.post('/api/analyse', { text: 'N1: NO + O3 -> NO2 + O2' });
    expect(res.headers['content-type']).toBe('application/json; charset=utf-8');
    expect(res.headers['server-timing']).toMatch(/^analyse;dur=\d+(\.\d)?, json;dur=\d+(\.\d)?$/);
  });
});
