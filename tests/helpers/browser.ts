import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';

export const SCREENSHOT_DIR = path.resolve('test-output', 'screenshots');

/** Debian's Chromium, headless; Playwright never downloads a browser here. */
export async function launchBrowser(): Promise<Browser> {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  return chromium.launch({ executablePath: '/usr/bin/chromium', args: ['--disable-gpu'] });
}

export async function screenshot(page: Page, name: string): Promise<string> {
  const file = path.join(SCREENSHOT_DIR, `${name}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}
