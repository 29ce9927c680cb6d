import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PEOPLE } from '@api/seed/demo-people';
import { launchBrowser, screenshot } from '../helpers/browser';
import { signInThroughForm, startE2eApp } from '../helpers/e2e-app';
import type { TestApp } from '../helpers/test-app';

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

describe('signing in as each demo role', () => {
  it.each(DEMO_PEOPLE.map((p) => [p.roles.join('+'), p]))('%s sees the navigation of that role', async (_label, person) => {
    const page = await browser.newPage({ viewport: { width: 1280, height: 800 } });
    await signInThroughForm(page, t.url, person.email);
    const header = page.getByRole('banner');
    await expect(header.getByRole('link', { name: 'Library', exact: true }).isVisible()).resolves.toBe(true);
    const reviews = header.getByRole('link', { name: 'My reviews' });
    const adopt = header.getByRole('link', { name: 'To adopt' });
    expect(await reviews.count()).toBe(person.roles.includes('reviewer') ? 1 : 0);
    expect(await adopt.count()).toBe(person.roles.includes('curator') ? 1 : 0);
    await page.goto(`${t.url}/admin/roles`);
    const adminTable = page.getByRole('table');
    if (person.roles.includes('admin')) {
      await adminTable.waitFor();
      expect(await page.getByText('anouk.spartina@saltmarsh.example.test').count()).toBeGreaterThan(0);
    } else {
      await page.waitForTimeout(300);
      expect(await adminTable.count()).toBe(0);
    }
    await screenshot(page, `roles-${person.roles.join('+')}`);
    await page.close();
  });

  it('sends a signed-out visitor to sign-in and back to where they wanted to go', async () => {
    const page = await browser.newPage();
    await page.goto(`${t.url}/account`);
    await page.waitForURL(/\/sign-in/);
    await page.getByLabel('E-mail').fill(DEMO_PEOPLE[0].email);
    await page.getByLabel('Password').first().fill('saltmarsh-demo-2026');
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await page.waitForURL(/\/account$/);
    await screenshot(page, 'account');
    await page.close();
  });
});
