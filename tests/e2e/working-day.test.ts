// A working day at volume: tables that fit a wide screen (with columns a person can hide and
// get back), and cards instead of tables on a phone, for the Queue, Jobs and Users.
import type { BrowserContext, Page } from 'playwright-core';

import { DEMO_PASSWORD } from '../../seeders/data/demo-people';
import { BASE_URL, DESKTOP, launchBrowser, PHONE, screenshot, signIn } from '../helpers/browser';
import { demoPerson, draftJob, submittedJob } from '../helpers/e2e-api';
import { completeRecord } from '../helpers/records';

jest.setTimeout(120_000);

async function openAs(viewport: { width: number; height: number }, who: string, path: string) {
  const browser = await launchBrowser(viewport);
  const page = await browser.newPage();
  await signIn(page, demoPerson(who).email, DEMO_PASSWORD);
  await page.waitForURL(/\/(queue|trends|jobs|admin)/);
  await page.goto(`${BASE_URL}${path}`);
  return { browser, page };
}

// The right edge of every column header, against the viewport.
const headerEdges = (page: Page, table: string) =>
  page.evaluate(
    `Array.from(document.querySelectorAll('[role="table"][aria-label="${table}"] [role="columnheader"]')).map((h) => [h.textContent, Math.round(h.getBoundingClientRect().right)])`,
  ) as Promise<[string, number][]>;

// Whether the list or table, or anything holding it, scrolls sideways (a row of filter chips
// elsewhere on the page may, by design).
const scrollsSideways = (page: Page, role: 'table' | 'list', name: string) =>
  page.evaluate(
    `(() => { let e = document.querySelector('[role="${role}"][aria-label="${name}"]'); const found = Boolean(e); let scrolls = false;
      for (; e; e = e.parentElement) if (e.scrollWidth > e.clientWidth + 1 && ['auto', 'scroll'].includes(getComputedStyle(e).overflowX)) scrolls = true;
      return found ? scrolls : 'missing'; })()`,
  ) as Promise<boolean | 'missing'>;

describe('at 1440 × 900', () => {
  let browser: BrowserContext;
  afterEach(() => browser?.close());

  it("shows the queue's default columns without scrolling sideways, and remembers a column the reviewer adds", async () => {
    const opened = await openAs(DESKTOP, 'ravi.', '/queue');
    browser = opened.browser;
    const { page } = opened;
    await page.getByRole('table', { name: 'Review queue' }).getByRole('row').nth(1).waitFor();
    const edges = await headerEdges(page, 'Review queue');
    expect(edges.map(([h]) => h)).toEqual(
      expect.arrayContaining([
        'Claim',
        'Technician',
        'Due / time left',
        'Priority',
        'Likely to come back',
        'State · whose turn',
        'Claimed by',
      ]),
    );
    for (const [header, right] of edges) expect([header, right <= DESKTOP.width]).toEqual([header, true]);
    expect(await scrollsSideways(page, 'table', 'Review queue')).toBe(false);
    await screenshot(page, 'queue-default-columns-desktop');

    await page.getByRole('button', { name: 'Columns (4 hidden)' }).click();
    await page.getByRole('checkbox', { name: 'Camera' }).click();
    await page.getByRole('columnheader', { name: /Camera/ }).waitFor();
    await page.reload();
    await page.getByRole('columnheader', { name: /Camera/ }).waitFor();
    await expect(page.getByRole('button', { name: 'Columns (3 hidden)' }).count()).resolves.toBe(1);
  });

  it("shows every column of the admin's Users table, the status and the action included", async () => {
    const opened = await openAs(DESKTOP, 'alex.', '/admin/users');
    browser = opened.browser;
    const { page } = opened;
    await page.getByRole('table', { name: 'Users' }).getByRole('row').nth(1).waitFor();
    const edges = await headerEdges(page, 'Users');
    expect(edges.map(([h]) => h)).toEqual(expect.arrayContaining(['Status', 'Action']));
    for (const [header, right] of edges) expect([header, right <= DESKTOP.width]).toEqual([header, true]);
    await screenshot(page, 'users-desktop');
  });
});

describe('at 390 × 844', () => {
  let browser: BrowserContext;
  afterEach(() => browser?.close());

  it.each([
    ['ravi.', '/queue', 'Review queue', ['Due / time left', 'State · whose turn', 'Claimed by']],
    ['mara.', '/jobs', 'Jobs', ['Property', 'Status', 'Due']],
    ['alex.', '/admin/users', 'Users', ['E-mail', 'Status', 'Action']],
  ])('%s sees %s as cards with every field, no table and nothing off screen', async (who, path, list, fields) => {
    const opened = await openAs(PHONE, who, path);
    browser = opened.browser;
    const { page } = opened;
    const cards = page.getByRole('list', { name: list }).getByRole('listitem');
    await cards.first().waitFor();
    await expect(page.getByRole('table', { name: list }).count()).resolves.toBe(0);
    for (const field of fields) await cards.first().getByText(field, { exact: true }).waitFor();
    expect(await scrollsSideways(page, 'list', list)).toBe(false);
    const box = (await cards.first().boundingBox())!;
    expect(box.x + box.width).toBeLessThanOrEqual(PHONE.width);
    await screenshot(page, `${list.toLowerCase().replace(/ /g, '-')}-cards-phone`);
  });
});

describe('bulk moves', () => {
  let browser: BrowserContext;
  afterEach(() => browser?.close());

  it('lets a manager shift-click three jobs and move them to another technician in one go', async () => {
    const stamp = Date.now().toString(36).toUpperCase();
    const refs = [1, 2, 3].map((n) => `BULK-${stamp}-${n}`);
    // The jobs are made through the API in a context of their own (it signs in and out).
    const setup = await launchBrowser(DESKTOP);
    try {
      for (const [i, ref] of refs.entries())
        await draftJob(setup.request, { technician: 'tess.', claimReference: ref, dueInHours: 24 + i });
    } finally {
      await setup.close();
    }
    const opened = await openAs(DESKTOP, 'mara.', `/jobs?q=BULK-${stamp}`);
    browser = opened.browser;
    const { page } = opened;
    await page.getByRole('checkbox', { name: `Select ${refs[0]}` }).click();
    await page.getByRole('checkbox', { name: `Select ${refs[0]}`, checked: true }).waitFor();
    await page.getByRole('checkbox', { name: `Select ${refs[2]}` }).click({ modifiers: ['Shift'] });
    await page.getByText('3 selected (shift-click selects a range)').waitFor();
    expect(new URL(page.url()).pathname).toBe('/jobs');
    await page.getByLabel('Move to technician').selectOption({ label: demoPerson('wren.').name });
    await page.getByRole('button', { name: 'Move 3 jobs' }).click();
    await page.getByText(`3 jobs moved to ${demoPerson('wren.').name}.`).waitFor();
    for (const [header, right] of await headerEdges(page, 'Jobs')) expect([header, right <= DESKTOP.width]).toEqual([header, true]);
    for (const ref of refs) await page.getByRole('row', { name: new RegExp(`${ref}.*${demoPerson('wren.').name}`) }).waitFor();
    await screenshot(page, 'jobs-bulk-moved-desktop');
  });

  it('lets a manager tick two queued records and give them to one reviewer, who is told once', async () => {
    const stamp = Date.now().toString(36).toUpperCase();
    const refs = [1, 2].map((n) => `GIVE-${stamp}-${n}`);
    const setup = await launchBrowser(DESKTOP);
    try {
      for (const ref of refs)
        await submittedJob(setup.request, { technician: 'wren.', claimReference: ref, dueInHours: 30, record: completeRecord() });
    } finally {
      await setup.close();
    }
    const opened = await openAs(DESKTOP, 'mara.', `/queue?q=GIVE-${stamp}`);
    browser = opened.browser;
    const { page } = opened;
    // Each tick is seen before the next, so the shift-click has its anchor.
    await page.getByRole('checkbox', { name: `Select ${refs[0]}` }).click();
    await page.getByRole('checkbox', { name: `Select ${refs[0]}`, checked: true }).waitFor();
    await page.getByRole('checkbox', { name: `Select ${refs[1]}` }).click({ modifiers: ['Shift'] });
    await page.getByRole('checkbox', { name: `Select ${refs[1]}`, checked: true }).waitFor();
    await page.getByLabel('Give to reviewer').selectOption({ label: demoPerson('hana.').name });
    await page.getByRole('button', { name: `Give 2 to ${demoPerson('hana.').name}` }).click();
    await page.getByText(`2 records given to ${demoPerson('hana.').name}.`).waitFor();
    // With the tick-box column, the manager's queue still fits the screen.
    for (const [header, right] of await headerEdges(page, 'Review queue')) expect([header, right <= DESKTOP.width]).toEqual([header, true]);
    for (const ref of refs) await page.getByRole('row', { name: new RegExp(`${ref}.*${demoPerson('hana.').name}`) }).waitFor();
    await screenshot(page, 'queue-claims-given-desktop');
  });
});
