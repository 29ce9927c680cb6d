import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startJobQueue, type JobQueue } from '@api/jobs/job-queue';
import { DEMO_PEOPLE } from '@api/seed/demo-people';
import { seedPeople } from '@api/seed/seed-people';
import { registerSimulationWorker } from '@api/simulations/simulation.worker';
import { signedInAgent, csrfAgent, type CsrfAgent } from '../helpers/agent';
import { startTestApp, type TestApp } from '../helpers/test-app';

let t: TestApp;
let jobs: JobQueue;
let stopThread: () => Promise<void>;
let author: CsrfAgent;

beforeAll(async () => {
  // The app serves and works the queue in one process, as `npm start` does.
  t = await startTestApp({}, async ({ db, url }) => {
    jobs = await startJobQueue(url);
    stopThread = await registerSimulationWorker(db, jobs);
    return { jobs };
  });
  await seedPeople(t.db);
  author = await signedInAgent(t.url, DEMO_PEOPLE[0].email);
}, 120_000);
afterAll(async () => {
  await jobs?.stop();
  await stopThread?.();
  await t?.close();
});

/** Reads the server-sent events of a run until `done`, returning every event's name and data. */
async function followEvents(id: string): Promise<{ event: string; data: { status: string; progress: number } }[]> {
  const res = await fetch(`${t.url}/api/simulations/${id}/events`, { headers: { cookie: author.agent.jar.getCookies({ domain: '127.0.0.1', path: '/', secure: false, script: false }).toValueString() } });
  expect(res.headers.get('content-type')).toMatch(/text\/event-stream/);
  const text = await res.text();
  return text
    .split('\n\n')
    .filter((block) => block.startsWith('event:'))
    .map((block) => {
      const [eventLine, dataLine] = block.split('\n');
      return { event: eventLine.slice(7), data: JSON.parse(dataLine.slice(6)) };
    });
}

const FIRST_ORDER = 'D1: N2O5 -> NO3 + NO2 @ 0.05\n';

describe('POST /api/simulations', () => {
  it('queues a run, streams progress to done, and the result follows the analytic first-order decay', async () => {
    const inputs = { initial: { N2O5: 1e12 }, tEnd: 60, points: 31, spacing: 'linear', light: { kind: 'constant', level: 1 } };
    const started = await author.post('/api/simulations', { text: FIRST_ORDER, inputs });
    expect(started.status).toBe(202);
    expect(started.body.status).toBe('queued');
    const events = await followEvents(started.body.id);
    expect(events.at(-1)).toMatchObject({ event: 'done', data: { status: 'succeeded', progress: 1 } });
    const run = await author.get(`/api/simulations/${started.body.id}`);
    expect(run.body.status).toBe('succeeded');
    const { times, concentrations, species } = run.body.result;
    const a = species.indexOf('N2O5');
    // [A] = [A]0 exp(−kt) (first-order decay; Atkins' Physical Chemistry, integrated rate laws).
    times.forEach((time: number, i: number) => {
      expect(concentrations[i][a]).toBeCloseTo(1e12 * Math.exp(-0.05 * time), -6);
    });
  });

  it('answers from the cache when the same text and inputs ran before', async () => {
    const inputs = { initial: { N2O5: 2e12 }, tEnd: 10, points: 5, spacing: 'linear' };
    const first = await author.post('/api/simulations', { text: FIRST_ORDER, inputs });
    await followEvents(first.body.id);
    const again = await author.post('/api/simulations', { text: FIRST_ORDER, inputs });
    expect(again.status).toBe(200);
    expect(again.body).toEqual({ id: first.body.id, status: 'succeeded', cached: true });
  });

  it('refuses text with errors, steps without a rate, unknown species and bad inputs, each naming where', async () => {
    const bad = await author.post('/api/simulations', { text: 'X1: NO + O3 -> NO2\n', inputs: { initial: { NO: 1 }, tEnd: 1 } });
    expect(bad.status).toBe(422);
    expect(bad.body.error.code).toBe('PARSE_FAILED');
    const noRate = await author.post('/api/simulations', { text: 'N1: NO + O3 -> NO2 + O2\n', inputs: { initial: { NO: 1 }, tEnd: 1 } });
    expect(noRate.status).toBe(422);
    expect(noRate.body.error.message).toMatch(/N1 \(line 1\)/);
    expect(noRate.body.error.code).toBe('NOT_SIMULABLE');
    const unknown = await author.post('/api/simulations', { text: FIRST_ORDER, inputs: { initial: { XYZ: 1 }, tEnd: 1 } });
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.details.unknown).toEqual(['XYZ']);
    const negative = await author.post('/api/simulations', { text: FIRST_ORDER, inputs: { initial: { N2O5: 1 }, tEnd: -5 } });
    expect(negative.status).toBe(400);
    expect(negative.body.error.details[0].path).toEqual(['inputs', 'tEnd']);
  });

  it('is private to whoever started it and needs a signed-in person', async () => {
    const started = await author.post('/api/simulations', { text: FIRST_ORDER, inputs: { initial: { N2O5: 3e12 }, tEnd: 5, points: 3, spacing: 'linear' } });
    const other = await signedInAgent(t.url, DEMO_PEOPLE[1].email);
    expect((await other.get(`/api/simulations/${started.body.id}`)).status).toBe(404);
    expect((await (await csrfAgent(t.url)).get(`/api/simulations/${started.body.id}`)).status).toBe(401);
  });
});

describe('POST /api/simulations/:id/cancel', () => {
  it('stops a long run between solver steps and records it as cancelled', async () => {
    // A Lotka–Volterra oscillator over many periods keeps the solver busy long enough to cancel.
    const text = ['%species Grass', '%species Hare', '%species Lynx', '%species Spent',
      'L1: Grass + Hare -> 2 Hare @ 1', 'L2: Hare + Lynx -> 2 Lynx @ 1', 'L3: Lynx -> Spent @ 1'].join('\n');
    const inputs = { initial: { Grass: 1, Hare: 0.5, Lynx: 0.2 }, fixed: ['Grass'], tEnd: 1e7, points: 2000, spacing: 'linear', rtol: 1e-10, atol: 1e-14 };
    const started = await author.post('/api/simulations', { text, inputs });
    expect(started.status).toBe(202);
    let status = 'queued';
    for (let i = 0; i < 100 && status !== 'running'; i += 1) {
      await new Promise((resolve) => setTimeout(resolve, 100));
      status = (await author.get(`/api/simulations/${started.body.id}`)).body.status;
    }
    expect(status).toBe('running');
    const cancelled = await author.post(`/api/simulations/${started.body.id}/cancel`);
    expect(cancelled.status).toBe(200);
    const events = await followEvents(started.body.id);
    expect(events.at(-1)!.data.status).toBe('cancelled');
  }, 120_000);

  it('cancels a queued run at once', async () => {
    const id = (await t.db('simulations').insert({ created_by: (await author.get('/api/me')).body.id, source_text: FIRST_ORDER, inputs: '{}', cache_key: 'x' }).returning('id'))[0].id;
    const res = await author.post(`/api/simulations/${id}/cancel`);
    expect(res.body.status).toBe('cancelled');
  });
});

describe('POST /api/simulations for a saved revision', () => {
  it('simulates a revision the person may read and answers 404 for a private one they may not', async () => {
    const created = await author.post('/api/mechanisms', { title: 'Pentoxide decay', visibility: 'private', source: FIRST_ORDER });
    expect(created.status).toBe(201);
    const revision = await author.get(`/api/mechanisms/${created.body.slug}/revisions/1`);
    const revisionId = revision.body.id;
    const inputs = { initial: { N2O5: 5e11 }, tEnd: 20, points: 3, spacing: 'linear' };
    const mine = await author.post('/api/simulations', { revisionId, inputs });
    expect([200, 202]).toContain(mine.status);
    const stranger = await signedInAgent(t.url, DEMO_PEOPLE[4].email);
    const theirs = await stranger.post('/api/simulations', { revisionId, inputs });
    expect(theirs.status).toBe(404);
  });
});
