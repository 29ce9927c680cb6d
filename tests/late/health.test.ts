import { execFileSync } from 'node:child_process';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from '../helpers/test-app';

// Runs alone, after every other suite (scripts/test.sh): it stops and restarts the test cluster.
const cluster = (script: 'pg-up.sh' | 'pg-down.sh') =>
  execFileSync('bash', [`scripts/${script}`], { env: { ...process.env, CLUSTER: 'test' }, stdio: 'ignore' });

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => {
  cluster('pg-up.sh');
  await t.close();
});

describe('GET /api/health', () => {
  it('answers 200, then 503 while PostgreSQL is stopped, then 200 again by itself after it restarts', async () => {
    const before = await request(t.url).get('/api/health');
    expect(before.status).toBe(200);
    expect(before.body).toEqual({ status: 'ok', database: 'up' });

    cluster('pg-down.sh');
    const down = await request(t.url).get('/api/health');
    expect(down.status).toBe(503);
    expect(down.body.database).toBe('down');

    cluster('pg-up.sh');
    let again = await request(t.url).get('/api/health');
    for (let attempt = 0; again.status !== 200 && attempt < 20; attempt += 1) {
      await new Promise((resolve) => setTimeout(resolve, 250));
      again = await request(t.url).get('/api/health');
    }
    expect(again.status).toBe(200);
  });
});
