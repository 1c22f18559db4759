// A technician on a phone fills a capture record, uploads a photo, sees a pre-submit
// warning, submits, and finds the job submitted.
import type { BrowserContext, Page } from 'playwright-core';

import { DEMO_PASSWORD, DEMO_PEOPLE } from '../../seeders/data/demo-people';
import { BASE_URL, launchBrowser, PHONE, screenshot, signIn } from '../helpers/browser';
import { PNG_1X1 } from '../helpers/sample-files';

jest.setTimeout(120_000);

const technician = DEMO_PEOPLE.find((p) => p.email.startsWith('tess.'))!;
const manager = DEMO_PEOPLE.find((p) => p.role === 'manager')!;
const claimReference = `E2E-${Date.now().toString(36).toUpperCase()}`;

let browser: BrowserContext;
let page: Page;

beforeAll(async () => {
  browser = await launchBrowser(PHONE);
  // A fresh job for the technician, created through the API as the manager would.
  const api = browser.request;
  await api.post(`${BASE_URL}/api/session`, {
    headers: { 'x-sightline-request': '1' },
    data: { email: manager.email, password: DEMO_PASSWORD },
  });
  const technicians = await (await api.get(`${BASE_URL}/api/technicians`)).json();
  const tess = technicians.technicians.find((t: { name: string }) => t.name === technician.name);
  const created = await api.post(`${BASE_URL}/api/jobs`, {
    headers: { 'x-sightline-request': '1' },
    data: {
      claimReference,
      street: '9 Pennowick Street',
      city: 'Maraskell',
      postcode: 'MK-3310',
      propertyType: 'single_family',
      lossType: 'water',
      lossDate: '2026-11-25',
      siteVisitDate: '2026-11-27',
      dueAt: new Date(Date.now() + 2 * 86_400_000).toISOString(),
      priority: 'urgent',
      technicianId: tess.id,
    },
  });
  expect(created.status()).toBe(201);
  await api.delete(`${BASE_URL}/api/session`, { headers: { 'x-sightline-request': '1' } });
  page = await browser.newPage();
});

afterAll(() => browser.close());

const group = (name: string) => page.getByRole('radiogroup', { name });

it('fills, uploads, warns, submits', async () => {
  await signIn(page, technician.email, DEMO_PASSWORD);
  await page.waitForURL(`${BASE_URL}/jobs`);
  await page.getByRole('link', { name: new RegExp(claimReference) }).click();
  await page.getByRole('heading', { name: `Job ${claimReference}` }).waitFor();

  await group('Camera class').getByRole('radio', { name: 'Depth camera on tripod' }).click();
  await group('Windows and glass doors (glazing) flagged').getByRole('radio', { name: 'Yes' }).click();
  await page.getByRole('checkbox', { name: 'Ground floor' }).click();
  await page.getByLabel('Stations on ground floor').fill('3');

  await page.getByRole('button', { name: 'Add a room' }).click();
  await page.getByLabel('Room name').fill('Kitchen');
  await page.getByLabel('Length (ft)').fill('12');
  await page.getByLabel('Width (ft)').fill('15');
  await page.getByLabel('Stations in this room').fill('3');
  await page.getByLabel('Total stations in the capture').fill('3');

  await page.getByRole('button', { name: 'Add a model' }).click();
  await page.getByLabel('Model reference on the capture platform').fill('TRC-55012');

  // Two photos in one pick; watch the progress bars reach 100 %, then caption one.
  const chooser = page.waitForEvent('filechooser');
  await page.getByRole('button', { name: 'Choose photos and upload' }).click();
  await (
    await chooser
  ).setFiles([
    { name: 'kitchen-ceiling.png', mimeType: 'image/png', buffer: PNG_1X1 },
    { name: 'hall-door.png', mimeType: 'image/png', buffer: PNG_1X1 },
  ]);
  await page.getByText('Uploaded kitchen-ceiling.png: 100 %').waitFor();
  await page.getByText('Uploaded hall-door.png: 100 %').waitFor();
  await page.getByText('kitchen-ceiling.png', { exact: true }).waitFor();
  const caption = page.getByLabel('Caption for kitchen-ceiling.png');
  await caption.fill('Kitchen ceiling stain, east corner');
  await caption.blur();
  await page.getByText('Caption saved').waitFor();
  await expect(page.getByRole('button', { name: 'Take photos' }).count()).resolves.toBe(1);

  // Still missing: processing confirmation; the warning about too few stations shows already.
  await page.getByText('Confirm that processing started on the capture platform.').waitFor();
  await page.getByText(/Kitchen: 3 stations for about 180 ft²; about 5 expected at 6 ft spacing/).waitFor();
  await page.getByRole('checkbox', { name: /started processing on the capture platform/ }).click();
  await page.getByText('Missing before you can submit').waitFor({ state: 'detached' });
  await page.getByText(/^Saved \d/).waitFor();
  await screenshot(page, 'capture-record-before-submit-phone');

  await page.getByRole('button', { name: 'Submit capture record' }).click();
  await page.getByText(/Submitted\. Latest: revision 1/).waitFor();
  await screenshot(page, 'capture-record-submitted-phone');

  await page.goto(`${BASE_URL}/jobs?status=submitted`);
  const card = page.getByRole('link', { name: new RegExp(claimReference) });
  await card.getByText('Submitted', { exact: true }).waitFor();
  await screenshot(page, 'my-jobs-submitted-phone');
});
