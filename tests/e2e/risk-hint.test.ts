// The rework-risk hint on a technician's phone: with the demo's two years of invented history
// the model earns the hint; a mirror found but not flagged raises it, flagging it lowers it.
// Then the manager reads the model page at 1440 × 900.
import { type APIRequestContext, request } from 'playwright-core';

import { DEMO_PASSWORD } from '../../seeders/data/demo-people';
import { BASE_URL, DESKTOP, launchBrowser, PHONE, screenshot, signIn } from '../helpers/browser';
import { as, call, demoPerson, draftJob } from '../helpers/e2e-api';

jest.setTimeout(180_000);

let api: APIRequestContext;
beforeAll(async () => {
  api = await request.newContext();
  // Under test the scheduled refit is off; the manager fits once.
  await as(api, 'mara.', () => call(api, 'post', '/api/risk-model/fit'));
});
afterAll(() => api.dispose());

const percent = async (text: Promise<string | null>) => Number(/came back (\d+) %/.exec((await text) ?? '')?.[1]);

it('rises when a mirror is left unflagged and falls when it is flagged', async () => {
  const browser = await launchBrowser(PHONE);
  const page = await browser.newPage();
  try {
    const claimReference = `RH-${Date.now().toString(36).toUpperCase()}`;
    const jobId = await draftJob(api, { technician: 'tess.', claimReference, dueInHours: 48 });
    await signIn(page, demoPerson('tess.').email, DEMO_PASSWORD);
    await page.waitForURL(`${BASE_URL}/jobs`);
    await page.goto(`${BASE_URL}/jobs/${jobId}`);
    await page.getByRole('heading', { name: `Job ${claimReference}` }).waitFor();
    await page.getByRole('radiogroup', { name: 'Camera class' }).getByRole('radio', { name: 'Depth camera on tripod' }).click();
    await page.getByRole('checkbox', { name: 'Ground floor' }).click();
    await page.getByRole('button', { name: 'Add a room' }).click();
    await page.getByLabel('Room name').fill('Bathroom');

    const hint = page.getByRole('region', { name: 'Likely to come back' });
    const sentence = hint.getByRole('status');
    await sentence.filter({ hasText: /^Records like this one came back \d+ % of the time\.$/ }).waitFor();
    await hint.getByText('About the record only, never a judgement of you: the model knows nothing of who captured it.').waitFor();
    const before = await percent(sentence.textContent());

    await page.getByLabel('Mirror found').fill('2');
    await hint.getByText(/Raised most by: 2 reflective surfaces found but not flagged/).waitFor();
    await hint.getByText(/What would lower it: Flag every mirror and glass surface you found\./).waitFor();
    const raised = await percent(sentence.textContent());
    expect(raised).toBeGreaterThan(before);
    await screenshot(page, 'risk-hint-raised-phone');

    await page.getByLabel('Mirror flagged').fill('2');
    await hint.getByText(/Raised most by: 2 reflective surfaces/).waitFor({ state: 'detached' });
    expect(await percent(sentence.textContent())).toBeLessThan(raised);
    await screenshot(page, 'risk-hint-lowered-phone');
  } finally {
    await browser.close();
  }
});

it('gives reviewers a "Likely to come back" column in the queue, in words and a percentage', async () => {
  const browser = await launchBrowser(DESKTOP);
  const page = await browser.newPage();
  try {
    await signIn(page, demoPerson('ravi.').email, DEMO_PASSWORD);
    await page.waitForURL(`${BASE_URL}/queue`);
    await page.getByRole('columnheader', { name: /Likely to come back/ }).waitFor();
    await page
      .getByRole('cell')
      .filter({ hasText: /^(Likely|Possibly|Unlikely) \(\d+ %\)$/ })
      .first()
      .waitFor();
    // Sortable like every queue column, from the server (the whole queue, not the page).
    await page
      .getByRole('columnheader', { name: /Likely to come back/ })
      .getByRole('button')
      .click();
    await page.waitForURL(/sort=risk/);
    await screenshot(page, 'risk-queue-column-desktop');
  } finally {
    await browser.close();
  }
});

it("shows the manager the model's figures, calibration and odds ratios", async () => {
  const browser = await launchBrowser(DESKTOP);
  const page = await browser.newPage();
  try {
    await signIn(page, demoPerson('mara.').email, DEMO_PASSWORD);
    await page.waitForURL((url) => !url.pathname.endsWith('/sign-in'));
    await page.getByRole('link', { name: /Rework-risk model/ }).click();
    await page.getByRole('heading', { name: 'Rework-risk model' }).waitFor();
    await page.getByText('The hint is shown to technicians and reviewers.').waitFor();
    await page.getByText(/^Held-out area under the ROC curve: 0\.\d\d \(95 % interval 0\.\d\d–/).waitFor();
    await page.getByRole('table', { name: 'Predicted against observed, by group' }).waitFor();
    await page.getByRole('row').filter({ hasText: 'Reflective surface found, not flagged (each)' }).waitFor();
    await screenshot(page, 'risk-model-desktop');
  } finally {
    await browser.close();
  }
});
