// Bytes a browser transfers before the sign-in screen can be used: a fresh profile (nothing
// cached), Debian's Chromium through the DevTools protocol. The page itself notes the moment
// the e-mail field and the Sign in button are in the document (a MutationObserver); every
// response that had finished by then (Resource Timing's responseEnd) counts, with its bytes
// on the wire from the protocol (encodedDataLength, headers included).
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

import { chromium } from 'playwright-core';

const READY_WATCH = `
  new MutationObserver(() => {
    if (window.__signInReady !== undefined) return;
    const field = document.querySelector('input[aria-label="E-mail"]');
    const button = [...document.querySelectorAll('[role="button"], button')].some((b) => b.textContent.trim() === 'Sign in');
    if (field && button) window.__signInReady = performance.now();
  }).observe(document, { subtree: true, childList: true });`;
const FINISHED_BY_READY = `(() => {
  const at = window.__signInReady;
  const entries = [...performance.getEntriesByType('navigation'), ...performance.getEntriesByType('resource')];
  return { at, done: entries.filter((e) => e.responseEnd <= at).map((e) => e.name) };
})()`;

export type FirstLoad = { bytes: number; requests: { url: string; bytes: number; encoding: string }[]; interactiveMs: number };

export async function measureFirstLoad(
  baseUrl: string,
  chromiumPath = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
): Promise<FirstLoad> {
  const profile = fs.mkdtempSync(path.join(os.tmpdir(), 'first-load-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: chromiumPath,
    headless: true,
    viewport: { width: 390, height: 844 },
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--no-first-run', '--disable-background-networking'],
  });
  try {
    const page = context.pages()[0] ?? (await context.newPage());
    const cdp = await context.newCDPSession(page);
    await cdp.send('Network.enable');
    await cdp.send('Network.setCacheDisabled', { cacheDisabled: true });
    const urls = new Map<string, { url: string; encoding: string }>();
    const finished: { url: string; bytes: number; encoding: string }[] = [];
    cdp.on('Network.responseReceived', (e) => {
      const headers = Object.fromEntries(Object.entries(e.response.headers).map(([k, v]) => [k.toLowerCase(), String(v)]));
      urls.set(e.requestId, { url: e.response.url, encoding: headers['content-encoding'] ?? 'identity' });
    });
    cdp.on('Network.loadingFinished', (e) => {
      const seen = urls.get(e.requestId);
      if (seen) finished.push({ ...seen, bytes: e.encodedDataLength });
    });
    // Plain strings: the page must not see helpers a TypeScript loader adds to functions.
    await page.addInitScript(READY_WATCH);
    await page.goto(`${baseUrl}/sign-in`);
    const email = page.getByLabel('E-mail');
    await email.waitFor({ state: 'visible', timeout: 30_000 });
    await email.fill('probe@example.test'); // it takes typing
    await page.waitForTimeout(1_500); // let later requests (fonts) finish, to leave them out by time
    const timing = (await page.evaluate(FINISHED_BY_READY)) as { at: number; done: string[] };
    const done = new Set(timing.done);
    const requests = finished.filter((r) => done.has(r.url));
    return { bytes: requests.reduce((sum, r) => sum + r.bytes, 0), requests, interactiveMs: Math.round(timing.at) };
  } finally {
    await context.close();
    fs.rmSync(profile, { recursive: true, force: true });
  }
}

// npx tsx scripts/bench/first-load.ts [url]
if (require.main === module) {
  measureFirstLoad(process.argv[2] ?? 'http://127.0.0.1:8080').then((r) => {
    for (const q of r.requests) console.log(`${String(q.bytes).padStart(9)} ${q.encoding.padEnd(8)} ${q.url}`);
    console.log(`${r.bytes} bytes before the sign-in form was interactive (${r.interactiveMs} ms)`);
  });
}
