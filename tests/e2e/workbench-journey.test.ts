import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PEOPLE } from '@api/seed/demo-people';
import { launchBrowser, screenshot } from '../helpers/browser';
import { signInThroughForm, startE2eApp } from '../helpers/e2e-app';
import type { TestApp } from '../helpers/test-app';

const author = DEMO_PEOPLE.find((person) => person.email.startsWith('rosalind'))!;

let t: TestApp;
let browser: Browser;
let page: Page;
beforeAll(async () => {
  t = await startE2eApp();
  browser = await launchBrowser();
  page = await browser.newPage({ viewport: { width: 1280, height: 900 } });
  await signInThroughForm(page, t.url, author.email);
});
afterAll(async () => {
  await browser?.close();
  await t?.close();
});

const editor = () => page.locator('.cm-content');
const errorMarks = () => page.locator('.cm-lintRange-error');

async function typeInEditor(text: string): Promise<void> {
  await editor().click();
  await page.keyboard.press('Control+End');
  await page.keyboard.insertText(text);
}

async function openPanel(name: string): Promise<void> {
  await page.getByRole('tab', { name }).click();
}

// The chlorine cycle of stratospheric ozone loss (a textbook catalytic cycle, common practice):
// Cl• + O3 → ClO• + O2, ClO• + O(3P) → Cl• + O2; net O3 + O(3P) → 2 O2 with Cl• as the catalyst.
describe('the workbench journey of an author', () => {
  it('starts a new mechanism from the library', async () => {
    await page.goto(t.url);
    await page.getByRole('link', { name: 'New mechanism' }).first().click();
    await page.waitForURL(/\/new$/);
    await page.getByLabel('Title').fill('Chlorine cycle over the salt pan');
    await editor().waitFor();
    await screenshot(page, 'workbench-new');
  });

  it('shows a syntax error while the line is unfinished, and drops it once the line is complete', async () => {
    await typeInEditor('C1: Cl• + O3 -> ClO• + O2   @ 2.3e-11 * exp(-200 / T)\nC2: ClO• + O(3P) ->');
    await errorMarks().first().waitFor();
    expect(await page.locator('.cm-lint-marker-error').count()).toBeGreaterThan(0);
    await screenshot(page, 'workbench-syntax-error');
    await page.keyboard.insertText(' Cl• + O2   @ 3.0e-11 * exp(70 / T)');
    await expect.poll(() => errorMarks().count(), { timeout: 10_000 }).toBe(0);
  });

  it('reports the server\'s imbalance and applies its suggested fix with one click', async () => {
    // Photolysis of Cl2 gives two chlorine atoms; written with one, the step loses a Cl.
    await typeInEditor('\nC3: Cl2 + hν -> Cl•   @ 0.0015');
    await errorMarks().first().waitFor({ timeout: 10_000 });
    const fix = page.locator('.cm-diagnosticAction', { hasText: 'Use' }).first();
    // The hover tooltip closes when a later check result replaces the marks (slow under load):
    // hover again until the action is clicked.
    await expect.poll(async () => {
      await errorMarks().first().hover();
      await fix.waitFor({ timeout: 3_000 });
      await screenshot(page, 'workbench-suggested-fix');
      return fix.click({ timeout: 3_000 }).then(() => true, () => false);
    }, { timeout: 30_000 }).toBe(true);
    await expect.poll(() => editor().textContent()).toContain('C3: Cl2 + hν → 2 Cl•');
    await expect.poll(() => errorMarks().count(), { timeout: 10_000 }).toBe(0);
  });

  it('names the net reaction and the catalyst', async () => {
    const status = page.getByRole('status').filter({ hasText: 'productive route' });
    await expect.poll(() => status.textContent(), { timeout: 10_000 }).toContain('3 steps · balanced · 1 productive route · 1 catalyst');
    await openPanel('Routes');
    const routes = page.getByRole('region', { name: 'Routes' });
    await expect.poll(async () => (await routes.textContent())?.replace(/\s+/g, ' ')).toContain('O3 + O(3P) → 2 O2');
    expect(await routes.textContent()).toContain('Overall');
    await openPanel('Species');
    const catalystRow = page.getByRole('region', { name: 'Species' }).getByRole('row').filter({ hasText: 'catalyst' });
    await expect.poll(() => catalystRow.count()).toBe(1);
    expect(await catalystRow.textContent()).toContain('Cl•');
    await screenshot(page, 'workbench-species');
  });

  it('saves r1 and opens the new mechanism at its own address', async () => {
    await page.getByLabel('Change note').fill('First two steps of the chlorine cycle');
    await page.getByRole('button', { name: 'Create r1' }).click();
    await page.waitForURL(/\/m\/chlorine-cycle-over-the-salt-pan$/);
    await page.getByRole('heading', { name: 'Chlorine cycle over the salt pan' }).waitFor();
    expect(await page.getByRole('combobox', { name: 'Revision', exact: true }).textContent()).toContain('r1');
  });

  it('edits and saves r2 with Ctrl+S', async () => {
    await typeInEditor('\nC4: ClO• + ClO• -> Cl2 + O2   @ 1.0e-12');
    await page.getByLabel('Change note').fill('Self-reaction of ClO');
    await page.keyboard.press('Control+s');
    await page.getByText('Saved r2').waitFor();
    expect(await page.getByRole('combobox', { name: 'Revision', exact: true }).textContent()).toContain('r2');
    await openPanel('Steps');
    await page.getByRole('region', { name: 'Steps' }).getByRole('button', { name: 'C4' }).waitFor();
    await screenshot(page, 'workbench-r2');
  });
});
