import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { gzipSync } from 'node:zlib';
import { chromium, type Page } from 'playwright-core';
import { generateMechanism } from '../../examples/generate-large';
import { DEMO_PASSWORD } from '../seed/demo-people';
import { ANALYSE_DELAY_MS } from '../../web/composables/useLiveAnalysis';
import type { BenchRow, BenchSuite } from './types';

/**
 * The web client in Chromium, against a running server that serves the built client (`npm start`
 * builds dist/web and serves it on :3000 with the demo seeded; BENCH_WEB_URL names another). It builds
 * nothing and saves nothing: the large mechanism is only typed into a new, unsaved draft.
 */
const BASE = process.env.BENCH_WEB_URL ?? 'http://127.0.0.1:3000';
const GROUP = 'web';
const STEPS = 2000;
const REPEATS = 3;
const EMAIL = 'rosalind.samphire@saltmarsh.example.test';
const gzipKb = (body: Buffer) => gzipSync(body).length / 1024;
const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];

/** Every JavaScript file the page loads, gzipped as a server would send it. */
function recordScripts(page: Page): () => Promise<number> {
  const bodies: Promise<Buffer>[] = [];
  page.on('response', (response) => {
    if (response.request().resourceType() === 'script') bodies.push(response.body());
  });
  return async () => (await Promise.all(bodies)).reduce((sum, body) => sum + gzipKb(body), 0);
}

async function signIn(page: Page): Promise<void> {
  await page.goto(`${BASE}/sign-in`);
  await page.getByLabel('E-mail').fill(EMAIL);
  await page.getByLabel('Password').first().fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
}

/** The whole client's JavaScript, gzipped: what the first screen would cost without lazy loading. */
function wholeClientKb(): number {
  // The build the server serves: WEB_DIR names it when it is not dist/web, as for the server.
  const assets = path.resolve(process.env.WEB_DIR ?? path.join('dist', 'web'), 'assets');
  return readdirSync(assets).filter((file) => file.endsWith('.js')).reduce((sum, file) => sum + gzipKb(readFileSync(path.join(assets, file))), 0);
}

async function firstScreen(page: Page): Promise<BenchRow> {
  const scripts = recordScripts(page);
  await signIn(page);
  await page.getByRole('table').or(page.getByText('Write your first mechanism')).first().waitFor();
  await page.waitForLoadState('networkidle');
  return {
    group: GROUP, name: 'JS for the first screen (sign-in + library), gzip', value: await scripts(), unit: 'KB',
    baseline: { name: 'all of dist/web/assets/*.js, gzip', value: wholeClientKb(), unit: 'KB' }, target: '< 250 KB',
  };
}

interface PageClock {
  __lastKeyAt: number;
  __seenAt: number | null;
}

/** From now on, notes the time of each key press and the first time `selector`'s text includes `text` (or, without text, its count rises). */
async function watchFor(page: Page, selector: string, text: string | null): Promise<void> {
  await page.evaluate(([css, wanted]) => {
    const clock = window as unknown as PageClock;
    clock.__seenAt = null;
    const before = document.querySelectorAll(css).length;
    // No named helper functions in here: the bundler would wrap them in a helper the page lacks.
    const observer = new MutationObserver(() => {
      const seen = wanted === null ? document.querySelectorAll(css).length > before : (document.querySelector(css)?.textContent ?? '').includes(wanted);
      if (clock.__seenAt === null && seen) {
        clock.__seenAt = performance.now();
        observer.disconnect();
      }
    });
    observer.observe(document.body, { subtree: true, childList: true, characterData: true, attributes: true });
  }, [selector, text] as const);
}

/** Milliseconds from the last key press to the awaited change on screen. */
async function elapsedSinceLastKey(page: Page): Promise<number> {
  await page.waitForFunction(() => (window as unknown as PageClock).__seenAt !== null, undefined, { timeout: 30_000 });
  return page.evaluate(() => {
    const clock = window as unknown as PageClock;
    return clock.__seenAt! - clock.__lastKeyAt;
  });
}

/** One edit at the end of the large mechanism: a step completed (server refresh), then broken (syntax). */
async function timeOneEdit(page: Page, round: number): Promise<{ syntax: number; refresh: number; render: number; server: number }> {
  await page.locator('.cm-content').click();
  await page.keyboard.press('Control+End');
  await page.keyboard.insertText(`\nZ${round}: O3 -> O`);
  await watchFor(page, '.workbench-status-line', `${STEPS + round} steps`);
  await page.keyboard.type('2');
  const refresh = await elapsedSinceLastKey(page);
  const { render, server } = await lastAnalysisShares(page);
  await watchFor(page, '.cm-lintRange-error', null);
  await page.keyboard.type(' +');
  const syntax = await elapsedSinceLastKey(page);
  await page.keyboard.press('Backspace');
  await page.keyboard.press('Backspace');
  return { syntax, refresh, render, server };
}

/**
 * The last analysis response: the client's own share (from its arrival to the change on screen)
 * and the server's, as its Server-Timing header gives it (analysis and JSON).
 */
function lastAnalysisShares(page: Page): Promise<{ render: number; server: number }> {
  return page.evaluate(() => {
    const entries = performance.getEntriesByType('resource').filter((entry) => entry.name.endsWith('/api/analyse'));
    const last = entries[entries.length - 1] as PerformanceResourceTiming;
    const server = last.serverTiming.reduce((sum, part) => sum + part.duration, 0);
    return { render: (window as unknown as PageClock).__seenAt! - last.responseEnd, server };
  });
}

/** The raw round trip of POST /api/analyse for the same text, from the page (no debounce, no rendering). */
async function analyseRoundTrip(page: Page, text: string): Promise<number> {
  return page.evaluate(async (body) => {
    const { csrfToken } = (await (await fetch('/api/session')).json()) as { csrfToken: string };
    const started = performance.now();
    const response = await fetch('/api/analyse', { method: 'POST', headers: { 'Content-Type': 'application/json', 'X-CSRF-Token': csrfToken }, body: JSON.stringify({ text: body }) });
    await response.json();
    return performance.now() - started;
  }, text);
}

async function largeMechanism(page: Page): Promise<BenchRow[]> {
  const text = generateMechanism(STEPS);
  await page.goto(`${BASE}/new`);
  await page.locator('.cm-content').click();
  await page.evaluate(() => document.addEventListener('keydown', () => ((window as unknown as PageClock).__lastKeyAt = performance.now()), { capture: true }));
  await page.keyboard.insertText(text);
  await page.locator('.workbench-status-line', { hasText: `${STEPS} steps` }).waitFor({ timeout: 60_000 });
  const edits = [];
  for (let round = 1; round <= REPEATS; round++) edits.push(await timeOneEdit(page, round));
  const roundTrips = [];
  for (let i = 0; i < REPEATS; i++) roundTrips.push(await analyseRoundTrip(page, text));
  const baseline = { name: 'POST /api/analyse round trip, same text', value: median(roundTrips), unit: 'ms' };
  return [
    { group: GROUP, name: `syntax error shown after the key (${STEPS} steps)`, value: median(edits.map((e) => e.syntax)), unit: 'ms', baseline },
    { group: GROUP, name: `diagnostics refreshed after typing stops (${STEPS} steps)`, value: median(edits.map((e) => e.refresh)), unit: 'ms', baseline, target: '< 300 ms' },
    { group: GROUP, name: `  of which: analysis arrived → on screen`, value: median(edits.map((e) => e.render)), unit: 'ms', baseline: { name: 'debounce after the last key', value: ANALYSE_DELAY_MS, unit: 'ms' } },
    { group: GROUP, name: `  of which: server analysis + JSON (Server-Timing)`, value: median(edits.map((e) => e.server)), unit: 'ms', baseline },
  ];
}

const webBench: BenchSuite = async () => {
  const browser = await chromium.launch({ executablePath: '/usr/bin/chromium', args: ['--disable-gpu'] });
  try {
    const page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
    const rows = [await firstScreen(page)];
    rows.push(...(await largeMechanism(page)));
    return rows;
  } finally {
    await browser.close();
  }
};

export default webBench;
