// Nothing a technician or reviewer types is lost: a bad field does not block the rest, edits
// made offline survive a reload and reach the server, two tabs meet a conflict screen, a photo
// picked offline uploads later, and a reviewer's half-scored rubric survives a reload.
import { type APIRequestContext, type BrowserContext, type Page, request } from 'playwright-core';

import { DEMO_PASSWORD } from '../../seeders/data/demo-people';
import { BASE_URL, DESKTOP, launchBrowser, PHONE, screenshot, signIn } from '../helpers/browser';
import { as, call, demoPerson, draftJob, submittedJob } from '../helpers/e2e-api';
import { completeRecord } from '../helpers/records';
import { PNG_1X1 } from '../helpers/sample-files';

jest.setTimeout(180_000);

const unique = () => `NLW-${Date.now().toString(36).toUpperCase()}${Math.floor(Math.random() * 1000)}`;
type Draft = {
  record: {
    cameraClass: string | null;
    levels: { level: string }[];
    rooms: { name: string; widthM: number | null; lengthM: number | null }[];
  };
  recordVersion: number;
};

// Set-up and checks go through their own API session, never the page's signed-in one.
let api: APIRequestContext;
beforeAll(async () => {
  api = await request.newContext();
});
afterAll(() => api.dispose());

async function serverDraft(jobId: number): Promise<Draft> {
  return as(api, 'tess.', () => call<Draft>(api, 'get', `/api/jobs/${jobId}`));
}

async function openJob(page: Page, jobId: number, claimReference: string) {
  await page.goto(`${BASE_URL}/jobs/${jobId}`);
  await page.getByRole('heading', { name: `Job ${claimReference}` }).waitFor();
}

const status = (page: Page) =>
  page
    .getByRole('status')
    .filter({ hasText: /Saved|Saving|Offline|attention|Conflict|Not saved|Nothing changed/ })
    .first();

describe('on a phone (390 × 844)', () => {
  let browser: BrowserContext;
  let page: Page;

  beforeAll(async () => {
    browser = await launchBrowser(PHONE);
    page = await browser.newPage();
    await signIn(page, demoPerson('tess.').email, DEMO_PASSWORD);
    await page.waitForURL(`${BASE_URL}/jobs`);
  });
  afterAll(() => browser.close());

  it('saves everything valid when one field is wrong, and marks that field', async () => {
    const claimReference = unique();
    const jobId = await draftJob(api, { technician: 'tess.', claimReference, dueInHours: 48 });
    await openJob(page, jobId, claimReference);
    await page.getByRole('radiogroup', { name: 'Camera class' }).getByRole('radio', { name: 'Depth camera on tripod' }).click();
    await page.getByRole('checkbox', { name: 'Ground floor' }).click();
    await page.getByRole('button', { name: 'Add a room' }).click();
    await page.getByLabel('Room name').fill('Laundry');
    await page.getByLabel('Length (ft)').fill('9');
    await page.getByLabel('Width (ft)').fill('-14');
    await page.getByText('Enter a number, 0 or more').waitFor();
    await status(page)
      .filter({ hasText: /1 field needs attention · Saved \d/ })
      .waitFor();
    await screenshot(page, 'no-lost-work-invalid-field-phone');

    const saved = await serverDraft(jobId);
    expect(saved.record.cameraClass).toBe('tripod_depth');
    expect(saved.record.levels.map((l) => l.level)).toEqual(['ground']);
    expect(saved.record.rooms[0]).toMatchObject({ name: 'Laundry', widthM: null });
    expect(saved.record.rooms[0].lengthM).toBeCloseTo(9 * 0.3048, 9);

    // A value the server refuses too (far past its limit) is caught on the phone, at its field.
    await page.getByLabel('Width (ft)').fill('99999');
    await page.getByText('At most 656 ft (200 m)').waitFor();
  });

  it('keeps edits made offline through a reload, and sends them when the connection returns', async () => {
    const claimReference = unique();
    const jobId = await draftJob(api, { technician: 'tess.', claimReference, dueInHours: 48 });
    await openJob(page, jobId, claimReference);
    // The app shell must be in the service worker's cache before the connection goes.
    await page.evaluate(async () => {
      await navigator.serviceWorker.ready;
      if (!navigator.serviceWorker.controller)
        await new Promise((resolve) => navigator.serviceWorker.addEventListener('controllerchange', resolve, { once: true }));
    });
    await page.reload();
    await page.getByRole('heading', { name: `Job ${claimReference}` }).waitFor();

    await browser.setOffline(true);
    await page.getByRole('button', { name: 'Add a room' }).click();
    await page.getByLabel('Room name').fill('Crawl-space stair');
    await status(page)
      .filter({ hasText: /^Offline — \d+ changes? kept on this phone$/ })
      .waitFor();
    await screenshot(page, 'no-lost-work-offline-phone');

    await page.reload();
    await page.getByRole('heading', { name: `Job ${claimReference}` }).waitFor();
    await expect(page.getByLabel('Room name').inputValue()).resolves.toBe('Crawl-space stair');

    await browser.setOffline(false);
    try {
      await status(page)
        .filter({ hasText: /^Saved \d/ })
        .waitFor({ timeout: 30_000 });
    } catch (error) {
      // What the phone showed, for whoever reads the failure.
      await screenshot(page, 'no-lost-work-not-synced-phone');
      throw error;
    }
    const saved = await serverDraft(jobId);
    expect(saved.record.rooms.map((r) => r.name)).toEqual(['Crawl-space stair']);
  });

  it('shows the conflict screen when a second tab saves over an older version', async () => {
    const claimReference = unique();
    const jobId = await draftJob(api, { technician: 'tess.', claimReference, dueInHours: 48 });
    await openJob(page, jobId, claimReference);
    const second = await browser.newPage();
    await openJob(second, jobId, claimReference);

    await page.getByRole('button', { name: 'Add a room' }).click();
    await page.getByLabel('Room name').fill('Kitchen (tab one)');
    await status(page)
      .filter({ hasText: /^Saved \d/ })
      .waitFor();

    await second.getByRole('button', { name: 'Add a room' }).click();
    await second.getByLabel('Room name').fill('Hallway (tab two)');
    await second.getByText('Conflict — choose a version').waitFor();
    await second.getByRole('alertdialog', { name: 'Two versions of this record' }).waitFor();
    await screenshot(second, 'no-lost-work-conflict-phone');
    // Nothing was overwritten: the server still has tab one's room.
    expect((await serverDraft(jobId)).record.rooms.map((r) => r.name)).toEqual(['Kitchen (tab one)']);

    await second.getByRole('button', { name: 'Keep my version' }).click();
    await status(second)
      .filter({ hasText: /^Saved \d/ })
      .waitFor();
    expect((await serverDraft(jobId)).record.rooms.map((r) => r.name)).toEqual(['Hallway (tab two)']);
    await second.close();
  });

  it('queues a photo picked offline and uploads it when the connection returns', async () => {
    const claimReference = unique();
    const jobId = await draftJob(api, { technician: 'tess.', claimReference, dueInHours: 48 });
    await openJob(page, jobId, claimReference);
    await browser.setOffline(true);
    const chooser = page.waitForEvent('filechooser');
    await page.getByRole('button', { name: 'Choose photos and upload' }).click();
    await (await chooser).setFiles({ name: 'attic-stain.png', mimeType: 'image/png', buffer: PNG_1X1 });
    await page.getByText('Kept on this phone; it uploads when the connection returns.').waitFor();
    await browser.setOffline(false);
    await page.getByText('Uploaded attic-stain.png: 100 %').waitFor({ timeout: 30_000 });
    const files = await as(api, 'tess.', () => call<{ files: { name: string }[] }>(api, 'get', `/api/jobs/${jobId}`));
    expect(files.files.map((f) => f.name)).toEqual(['attic-stain.png']);
  });

  it('refuses a photo too large to pass before sending it, naming the limit', async () => {
    const claimReference = unique();
    const jobId = await draftJob(api, { technician: 'tess.', claimReference, dueInHours: 48 });
    await openJob(page, jobId, claimReference);
    const chooser = page.waitForEvent('filechooser');
    await page.getByRole('button', { name: 'Choose photos and upload' }).click();
    await (await chooser).setFiles({ name: 'huge.jpg', mimeType: 'image/jpeg', buffer: Buffer.alloc(Math.round(30.2 * 1024 * 1024), 1) });
    await page.getByText('Photos up to 25 MB; this one is 30.2 MB.').waitFor();
    await expect(page.getByRole('button', { name: 'Retry upload' }).count()).resolves.toBe(0);
  });
});

describe('on a desktop (1440 × 900)', () => {
  it('keeps a half-scored rubric through a reload, and shows it to no other reviewer', async () => {
    const browser = await launchBrowser(DESKTOP);
    const other = await launchBrowser(DESKTOP);
    try {
      const claimReference = unique();
      const jobId = await submittedJob(api, { technician: 'tess.', claimReference, dueInHours: 24, record: completeRecord() });
      const page = await browser.newPage();
      await signIn(page, demoPerson('ravi.').email, DEMO_PASSWORD);
      await page.waitForURL(/\/queue/);
      await page.goto(`${BASE_URL}/queue/${jobId}`);
      await page.getByRole('button', { name: 'Claim to score' }).click();
      await page.getByText(/You hold the claim/).waitFor();

      await page.getByRole('radio', { name: /^Coverage completeness: 2:/ }).click();
      await page.getByLabel('Comment for Coverage completeness').fill('The attic and the garage are missing.');
      await page.getByText(/^Draft saved \d/).waitFor();
      await page.reload();
      await page.getByText(/You hold the claim/).waitFor();
      await expect(page.getByLabel('Comment for Coverage completeness').inputValue()).resolves.toBe(
        'The attic and the garage are missing.',
      );
      await expect(page.getByRole('radio', { name: /^Coverage completeness: 2:/ }).getAttribute('aria-checked')).resolves.toBe('true');
      await screenshot(page, 'no-lost-work-review-draft-desktop');

      const second = await other.newPage();
      await signIn(second, demoPerson('hana.').email, DEMO_PASSWORD);
      await second.waitForURL(/\/queue/);
      const workspace = await second.evaluate(async (id) => (await fetch(`/api/jobs/${id}/workspace`)).json(), jobId);
      expect(workspace.draft).toBeNull();
      await second.goto(`${BASE_URL}/queue/${jobId}`);
      await second.getByText(/holds the claim on this record/).waitFor();
      // Who holds it is said; no claim that would fail is offered.
      await expect(second.getByRole('button', { name: 'Claim to score' }).count()).resolves.toBe(0);
      await expect(second.getByText('The attic and the garage are missing.').count()).resolves.toBe(0);
    } finally {
      await browser.close();
      await other.close();
    }
  });
});
