// A reviewer on a wide screen filters the queue, claims with the keyboard, scores with the
// keyboard, watches the live total and requests rework.
import type { BrowserContext, Page } from 'playwright-core';

import { DEMO_PASSWORD } from '../../seeders/data/demo-people';
import { BASE_URL, DESKTOP, launchBrowser, screenshot, signIn } from '../helpers/browser';
import { as, call, demoPerson, submittedJob } from '../helpers/e2e-api';
import { completeRecord } from '../helpers/records';

jest.setTimeout(120_000);

const claimReference = `E2E-R-${Date.now().toString(36).toUpperCase()}`;
let browser: BrowserContext;
let page: Page;
let jobId: number;
let nextJobId: number;
let technicianId: number;

beforeAll(async () => {
  browser = await launchBrowser(DESKTOP);
  // Long overdue and hail, so it sorts first among this technician's hail jobs (overdue first, earliest due first).
  jobId = await submittedJob(browser.request, {
    technician: 'jonah.',
    claimReference,
    dueInHours: -2000,
    record: completeRecord(),
    lossType: 'hail',
  });
  // The next record in the same filter, for "Claim next".
  nextJobId = await submittedJob(browser.request, {
    technician: 'jonah.',
    claimReference: `${claimReference}-N`,
    dueInHours: -1999,
    record: completeRecord(),
    lossType: 'hail',
  });
  technicianId = await as(browser.request, 'mara.', async () => {
    const { technicians } = await call<{ technicians: { id: number; name: string }[] }>(browser.request, 'get', '/api/technicians');
    return technicians.find((t) => t.name === demoPerson('jonah.').name)!.id;
  });
  page = await browser.newPage();
});

afterAll(() => browser.close());

it('filters, claims and scores from the keyboard, then requests rework', async () => {
  await signIn(page, demoPerson('ravi.').email, DEMO_PASSWORD);
  await page.waitForURL(`${BASE_URL}/queue`);

  await page.getByLabel('Technician', { exact: true }).selectOption(String(technicianId));
  await page.getByLabel('Loss type').selectOption('hail');
  await page.waitForURL(/technicianId=/);
  expect(page.url()).toContain('lossType=hail');
  await page.getByRole('row', { name: new RegExp(`^${claimReference} `) }).waitFor();
  await screenshot(page, 'queue-filtered-desktop');

  // The filters survive a reload because they live in the URL.
  await page.reload();
  await page.getByRole('row', { name: new RegExp(`^${claimReference} `) }).waitFor();
  expect(await page.getByLabel('Loss type').inputValue()).toBe('hail');

  // The first row is selected; "c" claims it and opens the scoring screen.
  await page.locator('body').click({ position: { x: 5, y: 5 } });
  await page.keyboard.press('c');
  await page.waitForURL(new RegExp(`/queue/${jobId}\\?from=`));
  await page.getByText(/You hold the claim/).waitFor();

  // Keys: a score digit, then j to the next criterion. Non-applicable criteria ignore digits.
  for (const key of ['4', 'j', '4', 'j', '2', 'j', 'j', 'j', '4', 'j', 'j', 'j', 'p', 'j', '4']) await page.keyboard.press(key);
  // Without a comment on the criterion below full marks, the decision is refused with a
  // summary beside the button naming the criterion.
  await page.getByRole('radiogroup', { name: 'Decision' }).getByRole('radio', { name: 'Request rework' }).click();
  await page.getByRole('button', { name: 'Record decision' }).click();
  await page
    .getByRole('alert')
    .filter({ hasText: /1 thing to fix/ })
    .getByText(/Station spacing and doorway line of sight/)
    .waitFor();

  // A stock reason fills the comment with text the reviewer can edit.
  await page.getByRole('radio', { name: 'No doorway station', exact: true }).click();
  const comment = page.getByLabel('Comment for Station spacing and doorway line of sight');
  await expect(comment.inputValue()).resolves.toBe('No doorway station.');
  await comment.fill('No doorway station. Hallway has one station for 16 ft: add one at each end.');
  await page.getByLabel('Note to the technician (optional)').fill('Otherwise a clean capture.');

  // Applicable weights 18+16+12+6+4+8 = 64; spacing 2 of 4 loses 6: 100 × 58 / 64 = 90.625 → 90.6.
  await page.getByText('90.6', { exact: true }).waitFor();
  await page.getByText('Passes').waitFor();
  await page.getByRole('radiogroup', { name: 'Decision' }).getByRole('radio', { name: 'Request rework' }).click();
  await screenshot(page, 'scoring-before-decision-desktop');

  await page.getByRole('button', { name: 'Record decision' }).click();
  const done = page.getByRole('region', { name: 'Decision recorded' });
  await done.getByText(`Rework requested for ${claimReference} (1 item). E-mail to the technician queued.`).waitFor();
  await screenshot(page, 'decision-recorded-desktop');

  // "Claim next" takes the next record in the same filter, without the queue in between.
  await done.getByRole('button', { name: 'Claim next' }).click();
  await page.waitForURL(new RegExp(`/queue/${nextJobId}\\?from=`));
  await page.getByText(/You hold the claim/).waitFor();
  await page.getByRole('heading', { name: new RegExp(`${claimReference}-N`) }).waitFor();

  // (Signing in as the manager here shares the page's cookies, so it comes last.)
  const detail = await as(browser.request, 'mara.', () => call<{ job: { status: string } }>(browser.request, 'get', `/api/jobs/${jobId}`));
  expect(detail.job.status).toBe('rework_requested');
});
