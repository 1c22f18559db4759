import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import { type BrowserContext, chromium, type Page } from 'playwright-core';

export const BASE_URL = process.env.APP_URL ?? `http://127.0.0.1:${process.env.PORT ?? 8091}`;
export const ARTIFACTS = path.resolve(__dirname, '..', 'e2e', 'artifacts');
export const PHONE = { width: 390, height: 844 };
export const DESKTOP = { width: 1440, height: 900 };

// Debian's chromium through playwright-core: nothing is downloaded.
export async function launchBrowser(
  viewport: { width: number; height: number },
  options: { bypassCSP?: boolean } = {},
): Promise<BrowserContext> {
  const profile = fs.mkdtempSync(path.join(os.tmpdir(), 'chromium-profile-'));
  return chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    viewport,
    // The accessibility audit injects axe-core as a script; our CSP would refuse it.
    bypassCSP: options.bypassCSP ?? false,
    args: [
      '--headless',
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
}

export async function screenshot(page: Page, name: string) {
  fs.mkdirSync(ARTIFACTS, { recursive: true });
  await page.screenshot({ path: path.join(ARTIFACTS, `${name}.png`), fullPage: true });
}

export async function signIn(page: Page, email: string, password: string) {
  await page.goto(`${BASE_URL}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}
