// A technician plans the visit at the door on a phone: a house with a detached garage and a
// crawl space entered from outside, a depth camera on a sunny day. Sightline suggests three
// models (common practice: a tripod depth camera cannot link structures outdoors in direct
// sun); the record then opens filled in. The same plan made offline reaches the server later.
import { type APIRequestContext, type BrowserContext, type Page, request } from 'playwright-core';

import { DEMO_PASSWORD } from '../../seeders/data/demo-people';
import { BASE_URL, DESKTOP, launchBrowser, PHONE, screenshot, signIn } from '../helpers/browser';
import { as, call, demoPerson, draftJob } from '../helpers/e2e-api';

jest.setTimeout(180_000);

const unique = () => `VP-${Date.now().toString(36).toUpperCase()}${Math.floor(Math.random() * 1000)}`;

type PlanOnServer = { version: number; plan: { rooms: { name: string }[]; models: { structure: string; splitReason: string | null }[] } };
type RecordOnServer = {
  record: {
    cameraClass: string | null;
    rooms: { name: string; stations: number }[];
    models: { structure: string; splitReason: string | null }[];
    levels: { level: string; stations: number }[];
    safety: { hazards: string[] };
  };
};

let api: APIRequestContext;
let browser: BrowserContext;
let page: Page;

beforeAll(async () => {
  api = await request.newContext();
  browser = await launchBrowser(PHONE);
  page = await browser.newPage();
  await signIn(page, demoPerson('tess.').email, DEMO_PASSWORD);
  await page.waitForURL(`${BASE_URL}/jobs`);
});
afterAll(async () => {
  await browser.close();
  await api.dispose();
});

const serverPlan = (jobId: number) => as(api, 'tess.', () => call<PlanOnServer>(api, 'get', `/api/jobs/${jobId}/plan`));
const serverRecord = (jobId: number) => as(api, 'tess.', () => call<RecordOnServer>(api, 'get', `/api/jobs/${jobId}`));

const status = () =>
  page
    .getByRole('status')
    .filter({ hasText: /Saved|Saving|Offline|attention|Conflict|Not saved|Nothing changed/ })
    .first();

const next = (title: string) => page.getByRole('button', { name: `Next: ${title}` }).click();

async function addRoom(index: number, name: string, lengthFt: string, widthFt: string) {
  await page.getByRole('button', { name: 'Add a room' }).click();
  await page.getByLabel(`Room ${index} name`).fill(name);
  await page.getByLabel(`${name} length (ft)`).fill(lengthFt);
  await page.getByLabel(`${name} width (ft)`).fill(widthFt);
}

async function checkbox(name: string, want: boolean) {
  const box = page.getByRole('checkbox', { name });
  if ((await box.getAttribute('aria-checked')) !== String(want)) await box.click();
}

it('plans a house, a detached garage and an outside crawl space, accepts three models, and finds the record filled in', async () => {
  const claimReference = unique();
  const jobId = await draftJob(api, { technician: 'tess.', claimReference, dueInHours: 48, lossType: 'water' });
  await page.goto(`${BASE_URL}/jobs/${jobId}`);
  await page.getByRole('link', { name: 'Plan the visit' }).click();
  await page.getByRole('heading', { name: 'Step 1 of 6: Structures' }).waitFor();

  // 1. Structures: the dwelling is there; add the garage (no door from the house) and the crawl
  // space (its door is outside). A water loss leaves the garage out of scope until confirmed.
  await page.getByRole('button', { name: 'Add detached garage' }).click();
  await page.getByRole('button', { name: 'Add crawl space' }).click();
  await checkbox("Detached garage: in the claim's scope", true);
  await expect(
    page.getByRole('checkbox', { name: 'Crawl space: reached from inside the main structure' }).getAttribute('aria-checked'),
  ).resolves.toBe('false');
  await screenshot(page, 'visit-plan-structures-phone');

  // 2. Camera and conditions: depth camera, direct sun; three models suggested, with reasons.
  await next('Camera and models');
  await page.getByRole('radiogroup', { name: 'Camera class' }).getByRole('radio', { name: 'Depth camera on tripod' }).click();
  await checkbox('Direct sun on the outside walls now', true);
  await page
    .getByRole('status')
    .filter({ hasText: /loses surfaces in direct sun \(common practice\)/ })
    .waitFor();
  await page.getByText('Model 1: Main dwelling').first().waitFor();
  await page.getByRole('heading', { name: 'Suggested models' }).waitFor();
  await page.getByText('Model 2: Detached garage').first().waitFor();
  await page.getByText('Model 3: Crawl space').first().waitFor();
  await page.getByRole('button', { name: 'Accept the 3 suggested models' }).click();
  await page.getByRole('heading', { name: 'Your models (3)' }).waitFor();
  await page.getByText('As suggested. Change a reason or a note if the site says otherwise.').waitFor();
  await expect(
    page
      .getByRole('radiogroup', { name: 'Reason for splitting model 2' })
      .getByRole('radio', { name: 'Daylight too strong for the camera outdoors' })
      .getAttribute('aria-checked'),
  ).resolves.toBe('true');
  await screenshot(page, 'visit-plan-models-phone');

  // 3. Start and rooms: the lowest level in scope of the main model is the ground floor.
  await next('Start and rooms');
  await page.getByText('Add the rooms to see where to start.').waitFor();
  await addRoom(1, 'Kitchen', '12', '15');
  await addRoom(2, 'Hall', '10', '10');
  await page.getByText(/^Start on the ground floor, in a corner/).waitFor();
  await screenshot(page, 'visit-plan-rooms-phone');

  // 4. Stations and time: 180 ft² at 6 ft → 5, 100 ft² → 3 (common practice spacing);
  // 20 min set-up + 8 × 1.5 min = 32 min (Sightline's defaults, from memory).
  await next('Stations and time');
  await page.getByText('Expected stations: 8').waitFor();
  await page.getByText('Estimated time on site: 32 min (20 min set-up + 8 stations × 1.5 min).').waitFor();
  await screenshot(page, 'visit-plan-effort-phone');

  // 5. Hazards: the water loss's hazards come first, each with its caution.
  await next('Hazards');
  await page
    .getByText(/Follow local codes and licensed practice\./)
    .first()
    .waitFor();
  await checkbox('Standing water (likely here)', true);
  await checkbox('Crawl-space entry (likely here)', true);

  // 6. Kit: what is not ticked is shown once more before leaving.
  await next('Kit and leaving');
  await checkbox('Door wedges', true);
  await page.getByRole('button', { name: 'Leaving the site' }).click();
  await page.getByText(/^Not ticked on the kit list: Tripod with a level head/).waitFor();
  await screenshot(page, 'visit-plan-leaving-phone');
  await page.getByRole('button', { name: 'Not yet' }).click();
  await status()
    .filter({ hasText: /^Saved \d/ })
    .waitFor();

  const saved = await serverPlan(jobId);
  expect(saved.plan.models.map((m) => [m.structure, m.splitReason])).toEqual([
    ['main_dwelling', null],
    ['detached_garage', 'daylight'],
    ['crawl_space', 'daylight'],
  ]);
  expect(saved.plan.rooms.map((r) => r.name)).toEqual(['Kitchen', 'Hall']);

  // The record opens filled from the plan, and that filling is saved.
  await page.getByRole('button', { name: 'Open the capture record' }).click();
  await page.getByRole('heading', { name: `Job ${claimReference}` }).waitFor();
  await page.getByText(/^Filled from your visit plan/).waitFor();
  await page.getByText('Station counts still as planned (estimates): Kitchen, Hall. Enter the stations you took.').waitFor();
  await status()
    .filter({ hasText: /^Saved \d/ })
    .waitFor();
  await screenshot(page, 'visit-plan-record-filled-phone');
  const { record } = await serverRecord(jobId);
  expect(record.cameraClass).toBe('tripod_depth');
  expect(record.models.map((m) => [m.structure, m.splitReason])).toEqual([
    ['main_dwelling', null],
    ['detached_garage', 'daylight'],
    ['crawl_space', 'daylight'],
  ]);
  expect(record.rooms.map((r) => [r.name, r.stations])).toEqual([
    ['Kitchen', 5],
    ['Hall', 3],
  ]);
  expect(record.levels).toEqual([
    { level: 'crawl_space', stations: 0 },
    { level: 'ground', stations: 8 },
  ]);
  expect(record.safety.hazards.sort()).toEqual(['crawl_space_entry', 'standing_water']);
});

it('keeps a plan made offline on the phone, through a reload, and saves it when the connection returns', async () => {
  const claimReference = unique();
  const jobId = await draftJob(api, { technician: 'tess.', claimReference, dueInHours: 48 });
  await page.goto(`${BASE_URL}/jobs/${jobId}/plan`);
  await page.getByRole('heading', { name: 'Step 1 of 6: Structures' }).waitFor();
  // The app shell must be in the service worker's cache before the connection goes.
  await page.evaluate(`(async () => {
    await navigator.serviceWorker.ready;
    if (!navigator.serviceWorker.controller)
      await new Promise((resolve) => navigator.serviceWorker.addEventListener('controllerchange', resolve, { once: true }));
  })()`);
  await status()
    .filter({ hasText: /^Saved \d/ })
    .waitFor();
  await page.reload();
  await page.getByRole('heading', { name: 'Step 1 of 6: Structures' }).waitFor();

  await browser.setOffline(true);
  await page.getByRole('button', { name: 'Add shed' }).click();
  await next('Camera and models');
  await next('Start and rooms');
  await addRoom(1, 'Utility room', '8', '9');
  await status()
    .filter({ hasText: /^Offline — \d+ changes? kept on this phone$/ })
    .waitFor();
  await screenshot(page, 'visit-plan-offline-phone');

  await page.reload();
  await page.getByRole('heading', { name: 'Step 1 of 6: Structures' }).waitFor();
  await page.getByRole('group', { name: /^Structure 2: Shed/ }).waitFor();
  await page.getByRole('tab', { name: 'Step 3: Start and rooms' }).click();
  await expect(page.getByLabel('Room 1 name').inputValue()).resolves.toBe('Utility room');

  await browser.setOffline(false);
  await status()
    .filter({ hasText: /^Saved \d/ })
    .waitFor({ timeout: 30_000 });
  const saved = await serverPlan(jobId);
  expect(saved.plan.rooms.map((r) => r.name)).toEqual(['Utility room']);
});

it("lets a manager add to a camera class's kit list at 1440 × 900, and the technician's next plan lists it", async () => {
  const desk = await launchBrowser(DESKTOP);
  const manager = await desk.newPage();
  try {
    await signIn(manager, demoPerson('mara.').email, DEMO_PASSWORD);
    await manager.waitForURL((url) => !url.pathname.endsWith('/sign-in'));
    await manager.goto(`${BASE_URL}/kit`);
    const card = manager.getByRole('group', { name: 'Depth camera on tripod' });
    const kit = card.getByLabel('Kit list for Depth camera on tripod (one item a line)');
    const item = `Moisture meter ${Date.now().toString(36)}`;
    await kit.fill(`${await kit.inputValue()}\n${item}`);
    await card.getByRole('button', { name: 'Save Depth camera on tripod' }).click();
    await manager.getByText('Saved. Plans made from now on use these for a depth camera on tripod.').waitFor();
    await screenshot(manager, 'visit-plan-kit-settings-desktop');

    const jobId = await draftJob(api, { technician: 'tess.', claimReference: unique(), dueInHours: 48 });
    await page.goto(`${BASE_URL}/jobs/${jobId}/plan`);
    await page.getByRole('tab', { name: 'Step 2: Camera and models' }).click();
    await page.getByRole('radiogroup', { name: 'Camera class' }).getByRole('radio', { name: 'Depth camera on tripod' }).click();
    await page.getByRole('tab', { name: 'Step 6: Kit and leaving' }).click();
    await page.getByRole('checkbox', { name: item }).waitFor();
  } finally {
    await desk.close();
  }
});
