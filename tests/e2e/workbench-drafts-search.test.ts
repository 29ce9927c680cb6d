import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PEOPLE } from '@api/seed/demo-people';
import { launchBrowser, screenshot } from '../helpers/browser';
import { signInThroughForm, startE2eApp } from '../helpers/e2e-app';
import type { TestApp } from '../helpers/test-app';

const author = DEMO_PEOPLE.find((person) => person.email.startsWith('rosalind'))!;

let t: TestApp;
let browser: Browser;
let context: BrowserContext;
let page: Page;
beforeAll(async () => {
  t = await startE2eApp();
  browser = await launchBrowser();
  context = await browser.newContext({ viewport: { width: 1280, height: 900 } });
  page = await context.newPage();
  await signInThroughForm(page, t.url, author.email);
});
afterAll(async () => {
  await browser?.close();
  await t?.close();
});

const editorOf = (tab: Page) => tab.locator('.cm-content');

async function typeAtEnd(tab: Page, text: string): Promise<void> {
  await editorOf(tab).click();
  await tab.keyboard.press('Control+End');
  await tab.keyboard.insertText(text);
}

describe('the header search', () => {
  it('finds the mechanisms that use a species typed as plain text, in either spelling', async () => {
    await page.goto(t.url);
    for (const typed of ['BrO•', 'Br.']) {
      const box = page.getByRole('searchbox', { name: 'Search the library' });
      await box.fill(typed);
      await box.press('Enter');
      await page.waitForURL((url) => url.searchParams.get('q') === typed);
      await page.getByRole('link', { name: 'Salt-lake bromine cycle' }).first().waitFor({ timeout: 10_000 });
      expect(await page.getByText('Nothing matches these filters').count()).toBe(0);
    }
    await screenshot(page, 'w3-header-search-species');
  });
});

describe('a new mechanism', () => {
  it('clears the missing-title message once a title is typed, and a reload restores title and text', async () => {
    await page.goto(`${t.url}/new`);
    await editorOf(page).waitFor();
    await typeAtEnd(page, 'A1: O3 + hν -> O2 + O(3P)   @ 1e-5\nA2: O(3P) + O2 + M -> O3 + M\nA4: Xq + O3 -> O2');
    await page.getByRole('button', { name: 'Create r1' }).click();
    await page.getByText('Give the mechanism a title').waitFor();
    await page.getByLabel('Title').fill('Ozone photostationary state');
    await expect.poll(() => page.getByText('Give the mechanism a title').count()).toBe(0);
    // A step line that cannot be read is named, and the text is not called balanced.
    const status = page.getByRole('status').filter({ hasText: 'not read' });
    await expect.poll(() => status.textContent(), { timeout: 10_000 }).toContain('2 steps read, 1 line not read');
    expect(await status.textContent()).not.toContain('balanced');
    await screenshot(page, 'w3-new-title-status');
    await page.waitForTimeout(1500); // the draft is written a second after the last change
    await page.reload();
    await editorOf(page).waitFor();
    await expect.poll(() => page.getByLabel('Title').inputValue()).toBe('Ozone photostationary state');
    expect(await editorOf(page).textContent()).toContain('A2: O(3P) + O2 + M');
  });

  it('warns about the size limit while editing and refuses the save in plain words', async () => {
    await page.goto(`${t.url}/new`);
    await editorOf(page).waitFor();
    await page.getByRole('button', { name: 'Discard it' }).first().click().catch(() => undefined);
    await page.getByLabel('Title').fill('Too long');
    await editorOf(page).click();
    await page.keyboard.insertText(`# ${'x'.repeat(600_000)}\nA1: O3 -> O2 + O(3P)\n`);
    const warning = page.getByTestId('source-size');
    await warning.waitFor({ timeout: 15_000 });
    expect(await warning.textContent()).toContain('characters; a revision holds at most 500,000');
    await page.getByRole('button', { name: 'Create r1' }).click();
    const refusal = page.getByText(/^Not saved: /);
    await refusal.waitFor();
    expect(await refusal.textContent()).toMatch(/^Not saved: The text has 600,0\d\d characters; a revision holds at most 500,000\. Your text is kept in this browser\.$/);
    expect(await refusal.textContent()).not.toContain('Invalid input');
    await page.waitForTimeout(600); // let the message's entrance transition finish before the picture
    await screenshot(page, 'w3-size-limit');
    await page.getByRole('button', { name: 'Discard it' }).first().click().catch(() => undefined);
  });
});

describe('two tabs of one mechanism', () => {
  it('never restores the other tab’s text as this tab’s own after a conflict, and keeps both', async () => {
    const slug = 'salt-lake-bromine';
    const tabA = page;
    const tabB = await context.newPage();
    await tabA.goto(`${t.url}/m/${slug}`);
    await tabB.goto(`${t.url}/m/${slug}`);
    await editorOf(tabA).waitFor();
    await editorOf(tabB).waitFor();
    await typeAtEnd(tabB, '\n# typed in tab B');
    await typeAtEnd(tabA, '\n# typed in tab A');
    await tabA.getByRole('button', { name: 'Save revision' }).last().click();
    await tabA.getByText(/^Saved r\d+$/).waitFor();
    await tabB.getByRole('button', { name: 'Save revision' }).last().click();
    await tabB.getByText(/was saved while you were editing/).waitFor();
    await tabB.waitForTimeout(1500);

    await tabA.reload();
    await editorOf(tabA).waitFor();
    const foreign = tabA.getByTestId('foreign-draft');
    await foreign.waitFor({ timeout: 10_000 });
    expect(await foreign.textContent()).toMatch(/another tab or window .*\(based on r\d+; the latest is r\d+\)/);
    expect(await tabA.getByTestId('restored-draft').count()).toBe(0);
    expect(await editorOf(tabA).textContent()).not.toContain('typed in tab B');
    await screenshot(tabA, 'w3-two-tabs-a');

    await tabB.reload();
    await editorOf(tabB).waitFor();
    const restored = tabB.getByTestId('restored-draft');
    await restored.waitFor({ timeout: 10_000 });
    expect(await restored.textContent()).toMatch(/it is based on r\d+ and the latest is r\d+/);
    expect(await editorOf(tabB).textContent()).toContain('typed in tab B');
    await restored.getByRole('button', { name: /^Compare with r\d+$/ }).click();
    await tabB.getByText(/was saved while you were editing/).waitFor();
    await tabB.waitForTimeout(600);
    await screenshot(tabB, 'w3-two-tabs-b');
    await tabB.close();
  });

  it('names the catalyst among the species routes cancel in the Routes panel', async () => {
    await page.getByRole('tab', { name: 'Routes' }).click();
    const cancelled = page.locator('.workbench-routes-panel__cancelled li').filter({ hasText: 'Br•' }).first();
    await expect.poll(() => cancelled.textContent(), { timeout: 10_000 }).toContain('catalyst');
    await screenshot(page, 'w3-routes-cancelled');
  });
});

describe('importing', () => {
  it('refuses an empty .steps file in the preview and keeps the Import button off', async () => {
    await page.goto(`${t.url}/import`);
    await page.getByLabel('Files to import').setInputFiles([
      { name: 'empty.steps', mimeType: 'text/plain', buffer: Buffer.from('') },
      { name: 'ozone.steps', mimeType: 'text/plain', buffer: Buffer.from('A1: O3 + hν -> O2 + O(3P)\n') },
    ]);
    await page.getByText('refused: the file is empty').waitFor({ timeout: 10_000 });
    expect(await page.getByRole('button', { name: 'Import 2 mechanisms' }).isDisabled()).toBe(true);
    await screenshot(page, 'w3-import-empty');
  });
});
