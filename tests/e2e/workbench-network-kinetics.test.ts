import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startJobQueue, type JobQueue } from '@api/jobs/job-queue';
import { DEMO_PEOPLE } from '@api/seed/demo-people';
import { registerSimulationWorker } from '@api/simulations/simulation.worker';
import { launchBrowser, screenshot } from '../helpers/browser';
import { signInThroughForm, startE2eApp } from '../helpers/e2e-app';
import type { TestApp } from '../helpers/test-app';

const fieldStation = DEMO_PEOPLE.find((person) => person.email.startsWith('rosalind'))!;

let t: TestApp;
let jobs: JobQueue;
let stopThread: () => Promise<void>;
let browser: Browser;
let page: Page;

beforeAll(async () => {
  // The app serves and works the simulation queue in one process, as `npm start` does.
  t = await startE2eApp(async ({ db, url }) => {
    jobs = await startJobQueue(url);
    stopThread = await registerSimulationWorker(db, jobs);
    return { jobs };
  });
  browser = await launchBrowser();
  page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
  await signInThroughForm(page, t.url, fieldStation.email);
});
afterAll(async () => {
  await browser?.close();
  await jobs?.stop();
  await stopThread?.();
  await t?.close();
});

const graph = () => page.getByTestId('network-graph');

describe('the network and kinetics of the salt-lake bromine cycle', () => {
  it('draws the network with the overall route and the catalyst named', async () => {
    await page.goto(`${t.url}/m/salt-lake-bromine`);
    await page.getByRole('tab', { name: 'Network' }).click();
    await page.locator('[data-testid="network-graph"][data-status="ready"]').waitFor();
    await page.getByRole('combobox', { name: 'Route' }).click();
    await page.getByRole('option', { name: 'Overall · 2 O3 → 3 O2' }).click();
    const summary = page.getByTestId('network-summary');
    // Overall: 3 B1 + B2 + B3 + B4, 2 O3 → 3 O2 with Br• regenerated (the bromine ozone-loss cycle).
    await expect(summary.textContent()).resolves.toContain('Route steps: B1 ×3, B2 ×1, B3 ×1, B4 ×1.');
    await expect(summary.textContent()).resolves.toContain('Catalysts (↻): Br•.');
    expect(await graph().locator('canvas').count()).toBeGreaterThan(0);
    await screenshot(page, 'workbench-network-1280');
  });

  it('selects a step from the graph and exports a picture', async () => {
    const download = page.waitForEvent('download');
    await page.getByRole('button', { name: 'SVG' }).click();
    const file = await download;
    expect(file.suggestedFilename()).toMatch(/^salt-lake-bromine-r\d+-network\.svg$/);
  });

  it('runs a short simulation with progress, then plots it and widens the network by flux', async () => {
    await page.getByRole('tab', { name: 'Kinetics' }).click();
    await page.getByLabel('Time span (s)').fill('600');
    await page.getByLabel('Output points').fill('40');
    await page.getByRole('row', { name: /^O3\b/ }).getByRole('textbox').fill('1e12');
    await page.getByRole('row', { name: /^Br2\b/ }).getByRole('textbox').fill('1e9');
    await page.evaluate(() => {
      const seen: string[] = [];
      (window as unknown as { phases: string[] }).phases = seen;
      new MutationObserver(() => {
        const text = document.querySelector('[role="status"].workbench-kinetics-panel-run-bar__phase')?.textContent ?? '';
        if (text && seen.at(-1) !== text) seen.push(text);
      }).observe(document.body, { subtree: true, childList: true, characterData: true });
    });
    await page.getByRole('button', { name: 'Run simulation' }).click();
    await page.locator('[data-testid="concentration-chart"][data-status="ready"]').waitFor();
    const phases = await page.evaluate(() => (window as unknown as { phases: string[] }).phases);
    expect(phases.at(-1)).toBe('Finished');
    expect(phases.some((p) => /Sending|Queued|Running/.test(p))).toBe(true);
    await expect(page.getByText('Rates of production and loss by step').isVisible()).resolves.toBe(true);
    await expect(page.getByText('Element conservation').isVisible()).resolves.toBe(true);
    await screenshot(page, 'workbench-kinetics-1280');
    await page.getByRole('tab', { name: 'Network' }).click();
    await page.getByText('Edge widths: simulated fluxes').waitFor();
  });

  it('shows a refused run with where and why', async () => {
    await page.getByRole('tab', { name: 'Kinetics' }).click();
    await page.getByLabel('T (K)').fill('warm');
    await page.getByRole('button', { name: 'Run simulation' }).click();
    await page.getByText('“warm” is not a number').waitFor();
    await page.getByLabel('T (K)').fill('275');
  });

  it('fits a wide screen', async () => {
    await page.setViewportSize({ width: 1920, height: 1080 });
    await page.getByRole('tab', { name: 'Network' }).click();
    await page.locator('[data-testid="network-graph"][data-status="ready"]').waitFor();
    await screenshot(page, 'workbench-network-1920');
    await page.getByRole('tab', { name: 'Kinetics' }).click();
    await screenshot(page, 'workbench-kinetics-1920');
  });
});
