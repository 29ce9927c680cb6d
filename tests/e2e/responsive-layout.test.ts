import path from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PEOPLE } from '@api/seed/demo-people';
import { launchBrowser, screenshot, SCREENSHOT_DIR } from '../helpers/browser';
import { signInThroughForm, startE2eApp } from '../helpers/e2e-app';
import type { TestApp } from '../helpers/test-app';

// Reviewer and author: five header links, the longest row a demo person has.
const MEI = DEMO_PEOPLE.find((person) => person.email.startsWith('mei'))!;
const PHONE = { width: 390, height: 844 };
const SLUG = 'salt-lake-bromine';

let t: TestApp;
let browser: Browser;
beforeAll(async () => {
  t = await startE2eApp();
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await t?.close();
});

async function signedIn(viewport: { width: number; height: number }): Promise<Page> {
  const page = await browser.newPage({ viewport });
  await signInThroughForm(page, t.url, MEI.email);
  return page;
}

const pageWidth = (page: Page) => page.evaluate(() => document.documentElement.scrollWidth);
const box = async (page: Page, selector: string) => (await page.locator(selector).first().boundingBox())!;

/** How many lines a piece of text is set on (a line of its own each). */
const linesOf = (page: Page, selector: string) =>
  page.locator(selector).first().evaluate((element) => {
    const range = document.createRange();
    range.selectNodeContents(element);
    return new Set([...range.getClientRects()].map((rect) => Math.round(rect.top))).size;
  });

async function openSection(page: Page, name: string): Promise<void> {
  await page.getByRole('tab', { name }).click();
  await expect.poll(() => page.getByRole('tab', { name }).getAttribute('aria-selected')).toBe('true');
}

describe('at 390 px wide (a phone)', () => {
  it.each([
    ['library', '/', 'h1'],
    ['workbench', `/m/${SLUG}`, '.cm-content'],
    ['workbench Kinetics section', `/m/${SLUG}#kinetics`, '#kinetics-T'],
    ['sets', '/sets', 'h1'],
    ['catalogue', '/catalogue', 'h1'],
    ['account', '/account', '.account-view__details dd'],
  ])('the %s page does not scroll sideways', async (name, path, ready) => {
    const page = await signedIn(PHONE);
    await page.goto(`${t.url}${path}`);
    await page.locator(ready).first().waitFor();
    await page.waitForLoadState('networkidle');
    expect(await pageWidth(page), name).toBeLessThanOrEqual(PHONE.width);
    await screenshot(page, `responsive-390-${name.replace(/\s+/g, '-')}`);
    await page.close();
  });

  it('gives the catalogue table the full width and puts a chosen entry under it', async () => {
    const page = await signedIn(PHONE);
    await page.goto(`${t.url}/catalogue`);
    const table = page.locator('.catalogue-view__body .p-datatable');
    await table.waitFor();
    expect((await table.boundingBox())!.width).toBeGreaterThan(PHONE.width * 0.85);
    await page.locator('.catalogue-view__body tbody tr').first().click();
    const panel = page.locator('.catalogue-view__body > :nth-child(2)');
    await panel.waitFor();
    const tableBox = (await table.boundingBox())!;
    expect((await panel.boundingBox())!.y).toBeGreaterThanOrEqual(tableBox.y + tableBox.height);
    expect(await pageWidth(page)).toBeLessThanOrEqual(PHONE.width);
    await screenshot(page, 'responsive-390-catalogue-entry');
    await page.close();
  });

  it('folds the header links into a menu that opens, shows them all and goes where one is clicked', async () => {
    const page = await signedIn(PHONE);
    const header = page.getByRole('banner');
    expect(await header.getByRole('link', { name: 'Catalogue' }).isVisible()).toBe(false);
    const headerBox = (await header.boundingBox())!;
    for (const control of [header.getByRole('button', { name: 'Menu' }), header.getByRole('button', { name: MEI.name })]) {
      const { x, width } = (await control.boundingBox())!;
      expect(x + width).toBeLessThanOrEqual(headerBox.x + headerBox.width);
    }
    await header.getByRole('button', { name: 'Menu' }).click();
    const menu = page.locator('#header-nav-menu');
    await menu.waitFor();
    const entries = (await menu.getByRole('menuitem').allTextContents()).map((text) => text.replace(/\s+/g, ' ').trim());
    expect(entries.map((text) => text.replace(/ \d+ waiting$/, ''))).toEqual(['Library', 'Catalogue', 'Sets', 'Import', 'My reviews']);
    expect(await header.getByRole('button', { name: 'Menu' }).getAttribute('aria-expanded')).toBe('true');
    // Of the viewport only: a full-page capture resizes the window, and the popup closes on a resize.
    await page.screenshot({ path: path.join(SCREENSHOT_DIR, 'responsive-390-header-menu.png') });
    await menu.getByRole('menuitem', { name: 'Catalogue' }).click();
    await page.waitForURL(/\/catalogue$/);
    await menu.waitFor({ state: 'detached' });
    await page.close();
  });

  it('stacks the workbench: the editor at full width, the sections under it with every tab in view', async () => {
    const page = await signedIn(PHONE);
    await page.goto(`${t.url}/m/${SLUG}`);
    await page.locator('.cm-content').waitFor();
    const editor = await box(page, '.workbench-view__editor');
    const analysis = await box(page, '.workbench-view__analysis');
    expect(editor.width).toBeGreaterThan(PHONE.width * 0.9);
    expect(analysis.y).toBeGreaterThanOrEqual(editor.y + editor.height);
    const row = await box(page, '.workbench-panel-tabs .p-tablist');
    const tabs = page.locator('.workbench-panel-tabs [data-panel]');
    expect(await tabs.count()).toBe(8);
    for (const tab of await tabs.all()) {
      const { x, width } = (await tab.boundingBox())!;
      expect(x + width, (await tab.textContent())!).toBeLessThanOrEqual(row.x + row.width + 0.5);
      expect(x).toBeGreaterThanOrEqual(row.x - 0.5);
    }
    await page.locator('.workbench-view__analysis').scrollIntoViewIfNeeded();
    await screenshot(page, 'responsive-390-workbench-tabs');
    await page.close();
  });
});

describe('new mechanism, history and comparison', () => {
  let page: Page;
  beforeAll(async () => {
    page = await signedIn(PHONE);
  });
  afterAll(() => page.close());

  it('after "Create r1" the new address opens at the top, with the header in view', async () => {
    await page.goto(`${t.url}/new`);
    await page.getByLabel('Title').fill('Bromine nitrate at the salt pan');
    await page.locator('.cm-content').click();
    await page.keyboard.insertText('B1: BrO• + NO2• + M -> BrONO2 + M   @ 4.0e-31\nB2: BrONO2 + hν -> BrO• + NO2•   @ 1.0e-3');
    const create = page.getByRole('button', { name: 'Create r1' });
    await create.scrollIntoViewIfNeeded();
    expect(await page.evaluate(() => window.scrollY)).toBeGreaterThan(0);
    await create.click();
    await page.waitForURL(/\/m\/bromine-nitrate-at-the-salt-pan$/);
    await page.getByRole('heading', { name: 'Bromine nitrate at the salt pan' }).waitFor();
    await expect.poll(() => page.evaluate(() => window.scrollY)).toBe(0);
    expect(await page.getByRole('banner').isVisible()).toBe(true);
    // The owner's workbench has one more button in its header (Save revision), still inside the window.
    expect(await pageWidth(page)).toBeLessThanOrEqual(PHONE.width);
    await screenshot(page, 'responsive-390-after-create');
  });

  it('the History section has no select-all box, one-line "vs r1" links and a styled upload button', async () => {
    await page.locator('.cm-content').click();
    await page.keyboard.press('Control+End');
    // A long equation (balanced: Br2 N H O6 on each side), so that the comparison below must wrap it on a phone.
    await page.keyboard.insertText('\nB3: BrONO2 + HO2• + BrO• -> HOBr + O2 + NO2• + BrO•   @ 2.4e-12');
    await page.keyboard.press('Control+s');
    await page.getByText('Saved r2').waitFor();
    for (const width of [PHONE.width, 1280]) {
      await page.setViewportSize({ width, height: 900 });
      await openSection(page, 'History');
      const history = page.getByRole('region', { name: 'History' });
      await history.getByRole('button', { name: 'Compare r1 with r2' }).waitFor();
      expect(await history.locator('thead').getByRole('checkbox').count()).toBe(0);
      expect(await history.locator('tbody').getByRole('checkbox').count()).toBe(2);
      expect(await linesOf(page, '.workbench-history-panel__previous .p-button-label'), `vs r1 at ${width} px`).toBe(1);
      expect(await history.getByRole('button', { name: 'Upload a file' }).isVisible()).toBe(true);
      expect(await history.locator('input[type="file"]').isVisible()).toBe(false);
      await history.scrollIntoViewIfNeeded();
      await screenshot(page, `responsive-${width}-history`);
    }
  });

  it('ticking two revisions compares them under the mechanism\'s title, not its address', async () => {
    const history = page.getByRole('region', { name: 'History' });
    await history.getByRole('checkbox', { name: 'Pick r1 to compare' }).check();
    await history.getByRole('checkbox', { name: 'Pick r2 to compare' }).check();
    await history.getByRole('button', { name: 'Compare r1 → r2' }).click();
    await page.waitForURL(/\/compare\?from=1&to=2/);
    const heading = page.getByRole('heading', { level: 1 });
    await expect.poll(() => heading.textContent()).toContain('Bromine nitrate at the salt pan');
    expect(await heading.textContent()).not.toContain('bromine-nitrate-at-the-salt-pan');
    await page.locator('.compare-view-lines__row--added').first().waitFor();
    await screenshot(page, 'responsive-1280-compare');
    await page.setViewportSize(PHONE);
    expect(await pageWidth(page)).toBeLessThanOrEqual(PHONE.width);
    await screenshot(page, 'responsive-390-compare');
  });
});

describe('at 768 px wide (a tablet)', () => {
  it('keeps the header on one row: word-mark, search, folded links and the person\'s name', async () => {
    const page = await signedIn({ width: 768, height: 1024 });
    const header = page.getByRole('banner');
    const row = [
      header.getByRole('link', { name: 'Cyclewright, go to the library' }),
      header.getByRole('searchbox'),
      header.getByRole('button', { name: 'Menu' }),
      header.getByRole('button', { name: MEI.name }),
    ];
    const middles = await Promise.all(row.map(async (part) => {
      const { y, height } = (await part.boundingBox())!;
      return y + height / 2;
    }));
    expect(Math.max(...middles) - Math.min(...middles)).toBeLessThan(4);
    expect(await header.getByRole('button', { name: MEI.name }).textContent()).toContain(MEI.name);
    expect(await pageWidth(page)).toBeLessThanOrEqual(768);
    await screenshot(page, 'responsive-768-library');
    await page.close();
  });
});

describe.each([1280, 1920])('at %i px wide', (width) => {
  it('keeps the header links in a row and the workbench in two halves', async () => {
    const page = await signedIn({ width, height: 900 });
    await page.goto(`${t.url}/m/${SLUG}`);
    await page.locator('.cm-content').waitFor();
    const header = page.getByRole('banner');
    for (const name of ['Library', 'Catalogue', 'Sets', 'Import', 'My reviews']) {
      expect(await header.getByRole('link', { name, exact: true }).isVisible(), name).toBe(true);
    }
    expect(await header.getByRole('button', { name: 'Menu' }).isVisible()).toBe(false);
    expect(await header.getByRole('button', { name: MEI.name }).textContent()).toContain(MEI.name);
    const editor = await box(page, '.workbench-view__editor');
    const analysis = await box(page, '.workbench-view__analysis');
    expect(analysis.x).toBeGreaterThanOrEqual(editor.x + editor.width);
    expect(Math.abs(analysis.y - editor.y)).toBeLessThan(2);
    expect(await pageWidth(page)).toBeLessThanOrEqual(width);
    await screenshot(page, `responsive-${width}-workbench`);
    await page.goto(`${t.url}/`);
    await page.getByRole('heading', { name: 'Library', exact: true }).waitFor();
    expect(await pageWidth(page)).toBeLessThanOrEqual(width);
    await screenshot(page, `responsive-${width}-library`);
    await page.close();
  });
});
