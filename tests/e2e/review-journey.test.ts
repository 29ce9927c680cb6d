import { readFileSync } from 'node:fs';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startFakeSmtp, type FakeSmtp } from '@api/mail/fake-smtp';
import { createMailTransport, type MailTransport } from '@api/mail/mail-transport';
import { signedInAgent } from '../helpers/agent';
import { launchBrowser, screenshot } from '../helpers/browser';
import { signInThroughForm, startE2eApp } from '../helpers/e2e-app';
import type { TestApp } from '../helpers/test-app';

// The demo scenario's people (api/seed/demo-people.ts).
const AUTHOR = 'rosalind.samphire@saltmarsh.example.test';
const CURATOR = 'anouk.spartina@saltmarsh.example.test';
const REVIEWERS = ['kofi.glasswort@saltmarsh.example.test', 'mei.tidewell@saltmarsh.example.test'];
const ADMIN = 'ines.marram@saltmarsh.example.test';
const SLUG = 'nox-review-journey';
const SOURCE = readFileSync('examples/stratospheric-nox.steps', 'utf8');
const NEW_N1 = 'N1: NO• + O3 -> NO2• + O2           @ 3.0e-12 * exp(-1400 / T)';

let t: TestApp;
let smtp: FakeSmtp;
let transport: MailTransport;
let browser: Browser;

beforeAll(async () => {
  smtp = await startFakeSmtp();
  transport = createMailTransport({ host: '127.0.0.1', port: smtp.port, from: 'Cyclewright <no-reply@cyclewright.example.test>' });
  t = await startE2eApp({ mailTransport: transport, devInbox: smtp.messages });
  browser = await launchBrowser();
  const author = await signedInAgent(t.url, AUTHOR);
  const created = await author.post('/api/mechanisms', { title: 'NOx and ozone, for review', slug: SLUG, source: SOURCE, visibility: 'public' });
  expect(created.status).toBe(201);
});

afterAll(async () => {
  await browser?.close();
  await t?.close();
  transport?.close();
  await smtp?.close();
});

async function signedInPage(email: string, width = 1280): Promise<Page> {
  const context = await browser.newContext({ viewport: { width, height: 900 } });
  const page = await context.newPage();
  await signInThroughForm(page, t.url, email);
  return page;
}

/** Opens the mechanism on the workbench with one section of its right half showing. */
async function openSection(page: Page, section: 'review' | 'remarks' | 'history', path = `/m/${SLUG}`) {
  await page.goto(`${t.url}${path}`);
  await page.locator(`[data-panel="${section}"]`).click();
}

async function giveVerdict(email: string, name: string, verdict: 'Endorse', shot: string) {
  const page = await signedInPage(email);
  await openSection(page, 'review');
  await page.locator('.review-verdict-form .p-togglebutton', { hasText: verdict }).click();
  await page.getByRole('button', { name: 'Give verdict' }).click();
  await page.locator('.workbench-review-panel-summary li', { hasText: name }).filter({ hasText: 'endorse' }).waitFor();
  await page.locator('.review-verdict-form .p-button-loading').waitFor({ state: 'detached' });
  await screenshot(page, shot);
  await page.context().close();
}

describe('the review journey in the browser', () => {
  it('author opens a round on r1', async () => {
    const page = await signedInPage(AUTHOR);
    await openSection(page, 'review');
    await page.getByRole('button', { name: 'Open review round on r1' }).click();
    await page.getByText(/^Round on r1/).waitFor();
    await page.getByText('No reviewer assigned yet').waitFor();
    await screenshot(page, 'review-1-round-opened');
    await page.context().close();
  });

  it('curator assigns two reviewers', async () => {
    const page = await signedInPage(CURATOR);
    await openSection(page, 'review');
    for (const name of ['Kofi Glasswort', 'Mei Tidewell']) {
      await page.locator('.review-reviewer-assign__select').click();
      await page.getByRole('option', { name }).click();
      await page.getByRole('button', { name: 'Assign', exact: true }).click();
      await page.locator('.workbench-review-panel-summary li', { hasText: name }).waitFor();
    }
    expect(await page.locator('.review-round-timeline li', { hasText: 'as reviewer' }).count()).toBe(2);
    await screenshot(page, 'review-2-reviewers-assigned');
    await page.context().close();
  });

  it('a reviewer finds the round in My reviews and leaves a remark on step N1', async () => {
    const page = await signedInPage(REVIEWERS[0]);
    await page.goto(`${t.url}/my-reviews`);
    const row = page.locator('tbody tr', { hasText: 'NOx and ozone, for review' });
    await row.waitFor();
    await screenshot(page, 'review-3-my-reviews');
    await openSection(page, 'remarks');
    await page.locator('.workbench-remarks-panel-new__step').click();
    await page.getByRole('option', { name: /^N1:/ }).click();
    await page.locator('#remark-body').fill('Is the **N1** rate from the current JPL evaluation? The activation term looks old.');
    await page.locator('.workbench-remarks-panel-new .p-togglebutton', { hasText: 'Preview' }).click();
    await expect(page.locator('.remark-composer__preview strong').textContent()).resolves.toBe('N1');
    await page.getByRole('button', { name: 'Add remark' }).click();
    const thread = page.locator('article.remark-thread');
    await thread.waitFor();
    await expect(thread.locator('.remark-thread__label').textContent()).resolves.toBe('N1');
    await page.locator('.cm-remark-gutter .cm-remark-marker').first().waitFor();
    // The remark also sits under its step's line in the editor and under its row in Steps.
    const inline = page.locator('.cm-remark-inline');
    await inline.waitFor();
    await expect(inline.evaluate((block) => block.previousElementSibling?.textContent)).resolves.toMatch(/^N1:/);
    await expect(inline.textContent()).resolves.toMatch(/Kofi Glasswort.*Is the N1 rate from the current JPL evaluation\?.*0 replies.*open/);
    await page.locator('[data-panel="steps"]').click();
    const n1Row = page.locator('tbody tr', { has: page.locator('td:first-child', { hasText: /^N1$/ }) });
    await expect(n1Row.locator('xpath=following-sibling::tr[1]').textContent()).resolves.toMatch(/Kofi Glasswort.*Is the N1 rate/);
    await screenshot(page, 'review-4-remark');
    await page.context().close();
  });

  it('author saves r2 with a new N1 rate and the remark follows the step', async () => {
    const page = await signedInPage(AUTHOR);
    await openSection(page, 'remarks');
    await page.locator('.cm-line', { hasText: 'N1:' }).click();
    // CodeMirror's "select line" (Alt-L) takes the whole logical line with its break, wrapped or not.
    await page.keyboard.press('Alt+l');
    await page.keyboard.insertText(`${NEW_N1}\n`);
    await page.locator('#workbench-change-note').fill('N1 activation term updated after review');
    await page.getByRole('region', { name: 'Step editor' }).getByRole('button', { name: 'Save revision' }).click();
    await page.getByText('Saved r2').waitFor();
    await page.locator('[data-panel="review"]').click();
    await page.locator('[data-panel="remarks"]').click();
    await page.getByRole('heading', { name: 'Remarks on r2' }).waitFor();
    const thread = page.locator('article.remark-thread', { has: page.locator('.remark-thread__byline', { hasText: 'on r2' }) });
    await thread.waitFor();
    await expect(thread.locator('.remark-thread__label').textContent()).resolves.toBe('N1');
    expect(await thread.getByText('No longer matching').count()).toBe(0);
    // Under the new N1 line too; from the editor, Tab reaches the remark and Enter opens its thread.
    const inline = page.locator('.cm-remark-inline');
    await expect.poll(() => inline.evaluate((block) => block.previousElementSibling?.textContent)).toContain(NEW_N1.slice(0, 20));
    await page.locator('[data-panel="steps"]').click();
    await page.locator('.cm-line', { hasText: '%title' }).click();
    await page.keyboard.press('Control+Home');
    await page.keyboard.press('Tab');
    await expect(page.evaluate(() => document.activeElement?.className)).resolves.toContain('cm-remark-inline__item');
    await page.keyboard.press('Enter');
    await expect.poll(() => page.locator('[data-panel="remarks"]').getAttribute('aria-selected')).toBe('true');
    await expect.poll(() => page.evaluate(() => document.activeElement?.id)).toMatch(/^remark-thread-\d+$/);
    await expect(page.locator('.cm-selected-step').textContent()).resolves.toMatch(/^N1:/);
    await screenshot(page, 'review-5-remark-followed');
    await page.context().close();
  });

  it('both reviewers endorse r2', async () => {
    await giveVerdict(REVIEWERS[0], 'Kofi Glasswort', 'Endorse', 'review-6-first-endorsement');
    await giveVerdict(REVIEWERS[1], 'Mei Tidewell', 'Endorse', 'review-7-second-endorsement');
  });

  it('curator finds r2 in To adopt and adopts it on the workbench; header and queue follow without a reload', async () => {
    const page = await signedInPage(CURATOR);
    await page.goto(`${t.url}/to-adopt`);
    const row = page.locator('tbody tr', { hasText: 'NOx and ozone, for review' });
    await row.getByText('2 of 2').waitFor();
    await screenshot(page, 'review-8-to-adopt');
    await row.getByRole('link', { name: 'NOx and ozone, for review' }).click();
    await page.locator('[data-panel="review"]').click();
    const badge = page.locator('.workbench-header .library-round-state-tag');
    const queueCount = page.locator('[data-queue="to-adopt"] .p-badge');
    await expect.poll(() => badge.textContent()).toBe('endorsed');
    await expect(queueCount.textContent()).resolves.toBe('1');
    // A reload would make a fresh page; a marker on this one shows none happened.
    await page.evaluate(() => Object.assign(window, { notReloaded: true }));
    await page.getByRole('button', { name: 'Adopt r2' }).click();
    // The reviewer's remark on N1 is still open: it is listed, and adopting takes a confirmation.
    const caution = page.getByRole('alertdialog');
    await caution.waitFor();
    await expect(caution.textContent()).resolves.toContain('Step N1 — Kofi Glasswort: Is the N1 rate');
    await screenshot(page, 'review-8-adopt-caution');
    await caution.getByRole('button', { name: 'Adopt r2 anyway' }).click();
    await expect.poll(() => badge.textContent()).toBe('adopted');
    await expect.poll(() => page.getByLabel('Round timeline').textContent()).toContain('Anouk Spartina moved the round from endorsed to adopted');
    await expect.poll(() => page.locator('.workbench-header .p-select-label').textContent()).toMatch(/^r2 ★ reference/);
    await expect.poll(() => queueCount.count()).toBe(0);
    await expect(page.evaluate(() => (window as unknown as { notReloaded?: boolean }).notReloaded)).resolves.toBe(true);
    await screenshot(page, 'review-8-adopted-on-workbench');
    // The library, reached through the app's own link, shows the adoption as well.
    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Library' }).click();
    const listed = page.locator('tbody tr', { hasText: 'NOx and ozone, for review' });
    await expect.poll(() => listed.locator('.library-round-state-tag').textContent()).toBe('adopted');
    await expect(page.evaluate(() => (window as unknown as { notReloaded?: boolean }).notReloaded)).resolves.toBe(true);
    await openSection(page, 'history');
    await page.locator('tbody tr', { hasText: 'r2' }).getByText('reference').waitFor();
    await screenshot(page, 'review-9-history-reference');
    await page.context().close();
  });

  it('the comparison of r1 and r2 shows the changed step', async () => {
    const page = await signedInPage(AUTHOR, 1920);
    await openSection(page, 'history');
    await page.getByRole('button', { name: 'Compare r1 with r2' }).click();
    await page.waitForURL(/\/compare\?from=1&to=2/);
    const changed = page.locator('.compare-view-steps__item--changed');
    await changed.waitFor();
    await expect(changed.textContent()).resolves.toMatch(/N1.*exp\(-1500 \/ T\).*exp\(-1400 \/ T\)/s);
    await expect(page.locator('.compare-view-lines__row--added').allTextContents()).resolves.toEqual([expect.stringContaining(NEW_N1)]);
    expect(await page.locator('.compare-view-lines__row--removed').count()).toBe(1);
    await screenshot(page, 'review-10-compare-1920');
    await page.setViewportSize({ width: 1280, height: 900 });
    await screenshot(page, 'review-10-compare-1280');
    await page.context().close();
  });

  it('the eight sections fit their tab row at 1280 and 1920 px and answer the keyboard and the address hash', async () => {
    const page = await signedInPage(AUTHOR);
    for (const width of [1280, 1920]) {
      await page.setViewportSize({ width, height: 900 });
      await page.goto(`${t.url}/m/${SLUG}#history`);
      await expect.poll(() => page.locator('[data-panel="history"]').getAttribute('aria-selected')).toBe('true');
      const row = page.locator('.workbench-panel-tabs .p-tablist-tab-list');
      const fit = await row.evaluate((list) => ({ scroll: list.scrollWidth, client: list.clientWidth }));
      expect(fit.scroll, `tabs at ${width} px`).toBeLessThanOrEqual(fit.client);
      const rowBox = (await row.boundingBox())!;
      for (const tab of await page.locator('.workbench-panel-tabs [data-panel]').all()) {
        const box = (await tab.boundingBox())!;
        expect(box.x + box.width, `${await tab.textContent()} at ${width} px`).toBeLessThanOrEqual(rowBox.x + rowBox.width + 0.5);
        expect((await tab.textContent())!.trim()).not.toBe('');
      }
      await screenshot(page, `review-14-tabs-${width}`);
    }
    await page.locator('[data-panel="steps"]').click();
    await page.keyboard.press('ArrowRight');
    await expect(page.evaluate(() => document.activeElement?.getAttribute('data-panel'))).resolves.toBe('species');
    await page.keyboard.press('Enter');
    await expect.poll(() => page.locator('[data-panel="species"]').getAttribute('aria-selected')).toBe('true');
    await page.context().close();
  });

  it('author attaches a file from the History section; an empty file is refused with a reason', async () => {
    const page = await signedInPage(AUTHOR);
    await openSection(page, 'history');
    const input = page.locator('#attachment-file');
    await input.setInputFiles({ name: 'empty.csv', mimeType: 'text/csv', buffer: Buffer.alloc(0) });
    await page.getByText('“empty.csv” is empty: choose a file with content.').waitFor();
    const table = 'Field notes, salt lake station: NOx sampled at noon on three days.\n';
    await input.setInputFiles({ name: 'field-notes.txt', mimeType: 'text/plain', buffer: Buffer.from(table) });
    const link = page.getByRole('link', { name: 'field-notes.txt' });
    await link.waitFor();
    const download = await (await page.request.get(`${t.url}${await link.getAttribute('href')}`)).text();
    expect(download).toBe(table);
    await screenshot(page, 'review-12-attachments');
    await page.context().close();
  });

  it('the admin reads the captured e-mails in the development inbox', async () => {
    const page = await signedInPage(ADMIN);
    await page.goto(`${t.url}/dev/inbox`);
    await page.locator('tbody tr').first().waitFor();
    const subjects = await page.locator('tbody tr td:nth-child(3)').allTextContents();
    expect(subjects.length).toBeGreaterThanOrEqual(4);
    await screenshot(page, 'review-11-inbox');
    await page.setViewportSize({ width: 1920, height: 900 });
    await screenshot(page, 'review-11-inbox-1920');
    await page.goto(`${t.url}/account`);
    await page.getByLabel('A verdict on your mechanism').uncheck();
    await page.getByRole('button', { name: 'Save e-mail settings' }).click();
    await page.getByText('E-mail settings saved.').waitFor();
    await page.reload();
    // The boxes show "on" until the saved settings arrive; the saved "off" must then show.
    await expect.poll(() => page.getByLabel('A verdict on your mechanism').isChecked(), { timeout: 15_000 }).toBe(false);
    await screenshot(page, 'review-13-account-mail-1920');
    await page.context().close();
  });
});
