// The station plan of demo jobs: the technician's working record on a phone, and a reviewer's
// scoring screen on a desktop with the suggested comments.
import { DEMO_PASSWORD } from '../../seeders/data/demo-people';
import { BASE_URL, DESKTOP, launchBrowser, PHONE, screenshot, signIn } from '../helpers/browser';
import { as, call, demoPerson } from '../helpers/e2e-api';

jest.setTimeout(120_000);

async function jobIdOf(claimReference: string) {
  const browser = await launchBrowser(DESKTOP);
  try {
    return await as(browser.request, 'mara.', async () => {
      const { jobs } = await call<{ jobs: { id: number; claimReference: string }[] }>(
        browser.request,
        'get',
        `/api/jobs?q=${claimReference}`,
      );
      return jobs.find((j) => j.claimReference === claimReference)!.id;
    });
  } finally {
    await browser.close();
  }
}

it('shows the technician the plan of their draft while still on site (390 × 844)', async () => {
  const jobId = await jobIdOf('MRK-26-1115');
  const browser = await launchBrowser(PHONE);
  try {
    const page = await browser.newPage();
    await signIn(page, demoPerson('tess.').email, DEMO_PASSWORD);
    await page.waitForURL(`${BASE_URL}/jobs`);
    await page.goto(`${BASE_URL}/jobs/${jobId}`);
    await page.getByRole('heading', { name: 'Station layout' }).waitFor();
    await page.getByText(/^Findings: \d+ registered station/).waitFor();
    await page.getByRole('button', { name: 'Zoom in' }).click();
    await page
      .getByText(/Clark–Evans index R = /)
      .first()
      .scrollIntoViewIfNeeded();
    await page.getByRole('heading', { name: 'Station layout' }).scrollIntoViewIfNeeded();
    await screenshot(page, 'station-plan-phone');
  } finally {
    await browser.close();
  }
});

it('shows the reviewer the plan of a revision beside the rubric (1440 × 900)', async () => {
  const jobId = await jobIdOf('MRK-26-1110');
  const browser = await launchBrowser(DESKTOP);
  try {
    const page = await browser.newPage();
    await signIn(page, demoPerson('hana.').email, DEMO_PASSWORD);
    await page.waitForURL(`${BASE_URL}/queue`);
    await page.goto(`${BASE_URL}/queue/${jobId}`);
    await page.getByRole('heading', { name: 'Review MRK-26-1110' }).waitFor();
    await page
      .getByText(/You hold the claim|Claim to score/)
      .first()
      .waitFor();
    const claim = page.getByRole('button', { name: 'Claim to score' });
    if (await claim.isVisible()) await claim.click();
    await page.getByText(/You hold the claim/).waitFor();
    await page.getByRole('heading', { name: 'Station layout' }).waitFor();
    await page.getByText('From the station analysis (suggested, not scored):').first().waitFor();
    await page.getByRole('toolbar', { name: 'Zoom and pan the plan' }).waitFor();
    await page.getByRole('heading', { name: 'Station layout' }).scrollIntoViewIfNeeded();
    await screenshot(page, 'station-plan-desktop');
  } finally {
    await browser.close();
  }
});
