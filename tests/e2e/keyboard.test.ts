// The keyboard does what the screen shows (1440 × 900): the focused queue row is the one "c"
// claims, the focused criterion is the one a digit scores, Space chooses, and Enter on a link
// navigates once.
import { type APIRequestContext, type BrowserContext, type Page, request } from 'playwright-core';

import { DEMO_PASSWORD } from '../../seeders/data/demo-people';
import { BASE_URL, DESKTOP, launchBrowser, signIn } from '../helpers/browser';
import { demoPerson, submittedJob } from '../helpers/e2e-api';
import { completeRecord } from '../helpers/records';

jest.setTimeout(180_000);

let api: APIRequestContext;
let browser: BrowserContext;
let page: Page;
const stamp = Date.now().toString(36).toUpperCase();

beforeAll(async () => {
  api = await request.newContext();
  browser = await launchBrowser(DESKTOP);
  page = await browser.newPage();
  await signIn(page, demoPerson('hana.').email, DEMO_PASSWORD);
  await page.waitForURL(/\/queue/);
});

afterAll(async () => {
  await browser.close();
  await api.dispose();
});

const focusedText = () => page.evaluate(() => (document.activeElement as HTMLElement | null)?.innerText ?? '');

it('claims the focused queue row with "c", not the one highlighted before', async () => {
  const first = `KB-A-${stamp}`;
  const second = `KB-B-${stamp}`;
  // Far overdue, so both sort to the top of the queue.
  await submittedJob(api, { technician: 'wren.', claimReference: first, dueInHours: -5000, record: completeRecord() });
  const secondId = await submittedJob(api, { technician: 'wren.', claimReference: second, dueInHours: -4999, record: completeRecord() });
  await page.goto(`${BASE_URL}/queue?sort=due&dir=asc`);
  const rowB = page.getByRole('row').filter({ hasText: second });
  await rowB.waitFor();
  await rowB.focus();
  expect(await focusedText()).toContain(second);
  await expect(rowB.getAttribute('aria-selected')).resolves.toBe('true');
  await page.keyboard.press('c');
  await page.waitForURL(new RegExp(`/queue/${secondId}(\\?|$)`));
  await page.getByText(/You hold the claim/).waitFor();
});

it('scores the focused criterion with a digit, chooses with Space, and reaches every control by Tab', async () => {
  const jobId = await submittedJob(api, {
    technician: 'wren.',
    claimReference: `KB-C-${stamp}`,
    dueInHours: -4998,
    record: completeRecord(),
  });
  await page.goto(`${BASE_URL}/queue/${jobId}`);
  await page.getByRole('button', { name: 'Claim to score' }).click();
  await page.getByText(/You hold the claim/).waitFor();

  // Opening the rubric puts focus on the first criterion.
  await page.waitForFunction(() => document.activeElement?.getAttribute('role') === 'radio');
  expect(await page.evaluate(() => document.activeElement?.getAttribute('aria-label'))).toMatch(/^Coverage completeness: /);

  // Focus a radio of "Registration integrity" and press 4: that criterion is scored, no other.
  const damage = page.getByRole('radio', { name: /^Registration integrity: 0:/ });
  await damage.focus();
  await page.keyboard.press('4');
  await expect(page.getByRole('radio', { name: /^Registration integrity: 4:/ }).getAttribute('aria-checked')).resolves.toBe('true');
  await expect(page.getByRole('radio', { name: /^Coverage completeness: 4:/ }).getAttribute('aria-checked')).resolves.toBe('false');

  // Space on a decision choice chooses it and does not scroll the page.
  const reject = page.getByRole('radiogroup', { name: 'Decision' }).getByRole('radio', { name: 'Request rework' });
  await reject.focus();
  const scrolled = await page.evaluate(() => document.scrollingElement?.scrollTop ?? 0);
  await page.keyboard.press(' ');
  await expect(reject.getAttribute('aria-checked')).resolves.toBe('true');
  expect(await page.evaluate(() => document.scrollingElement?.scrollTop ?? 0)).toBe(scrolled);

  // Tab from the claim bar reaches every criterion's score choices and every decision; the decision
  // button stays out of the order only while it is disabled (nothing to record yet).
  await page.getByRole('button', { name: 'Release claim' }).focus();
  const names = new Set<string>();
  for (let i = 0; i < 300; i++) {
    await page.keyboard.press('Tab');
    const name = await page.evaluate(() => {
      const el = document.activeElement as HTMLElement | null;
      return el?.getAttribute('aria-label') ?? el?.innerText ?? '';
    });
    names.add(name);
    if (name === 'Recapture required (new site visit)') break;
  }
  const groups = await page
    .getByRole('radiogroup', { name: /^Score for / })
    .evaluateAll((els) => els.map((el) => el.getAttribute('aria-label')!.replace('Score for ', '')));
  expect(groups.length).toBeGreaterThan(3);
  expect(groups.filter((title) => ![...names].some((n) => n.startsWith(`${title}: `)))).toEqual([]);
  expect(names).toContain('Recapture required (new site visit)');
});

it('navigates once when Enter is pressed on a navigation link', async () => {
  const jobId = await submittedJob(api, {
    technician: 'wren.',
    claimReference: `KB-D-${stamp}`,
    dueInHours: -4997,
    record: completeRecord(),
  });
  await page.goto(`${BASE_URL}/queue`);
  await page.goto(`${BASE_URL}/queue/${jobId}`);
  await page.getByRole('heading', { name: /^Review / }).waitFor();
  const queueLink = page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Queue' });
  await queueLink.focus();
  await page.keyboard.press('Enter');
  await page.waitForURL(/\/queue(\?.*)?$/);
  await page.waitForTimeout(500);
  expect(new URL(page.url()).pathname).toBe('/queue');
  await page.goBack();
  await page.waitForURL(`${BASE_URL}/queue/${jobId}`);
});
