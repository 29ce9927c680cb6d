import path from 'node:path';
import { existsSync } from 'node:fs';
import type { Page } from 'playwright-core';
import { DEMO_PASSWORD } from '@api/seed/demo-people';
import { seedDemo } from '@api/seed/seed-demo';
import { startTestApp, type TestApp } from './test-app';

/**
 * The built client (scripts/test.sh builds it before the e2e suite) served by a test app with the
 * demo seeded. WEB_DIR names another build, as it does for the server, so that one engineer's
 * build does not replace the files another one's browser is reading.
 */
export async function startE2eApp(extra: Parameters<typeof startTestApp>[1] = {}): Promise<TestApp> {
  const webDir = path.resolve(process.env.WEB_DIR ?? path.join('dist', 'web'));
  if (!existsSync(path.join(webDir, 'index.html'))) throw new Error(`${webDir} is missing: run \`npx vite build\` first`);
  const app = await startTestApp({ webDir }, extra);
  await seedDemo(app.db);
  return app;
}

/** Signs in through the form, as a person would. */
export async function signInThroughForm(page: Page, baseUrl: string, email: string, password = DEMO_PASSWORD) {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').first().fill(password);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'));
}
