// The adjuster's page from a share link, with no account: on a phone and on a wide screen,
// the PDF download, and a withdrawn link saying so plainly.
import { sequelize } from '../../server/models';
import { BASE_URL, DESKTOP, launchBrowser, PHONE, screenshot } from '../helpers/browser';
import { deliverableJob } from '../helpers/delivery';

jest.setTimeout(120_000);

let delivered: Awaited<ReturnType<typeof deliverableJob>>;
beforeAll(async () => {
  delivered = await deliverableJob();
});
afterAll(() => sequelize.close());

for (const [name, viewport] of [
  ['phone', PHONE],
  ['desktop', DESKTOP],
] as const) {
  it(`shows the summary to anyone holding the link on a ${name} (${viewport.width} × ${viewport.height})`, async () => {
    const browser = await launchBrowser(viewport);
    try {
      const page = await browser.newPage();
      await page.goto(`${BASE_URL}/s/${delivered.token}`);
      await page.getByRole('heading', { name: 'What this capture does not show' }).waitFor();
      await page.getByText(`Claim ${delivered.job.claimReference}`).waitFor();
      await page.getByRole('heading', { name: 'Station plan: Ground floor' }).or(page.getByText('Damage')).first().waitFor();
      await page.getByLabel('Photo: p.png').waitFor();
      // Nothing of the rest of Sightline: no navigation, no sign-out, no other job.
      expect(await page.getByRole('navigation').count()).toBe(0);
      await screenshot(page, `share-${viewport.width}x${viewport.height}`);

      if (name === 'desktop') {
        const [download] = await Promise.all([
          page.waitForEvent('download'),
          page.getByRole('link', { name: 'Download the summary (PDF)' }).click(),
        ]);
        expect(download.suggestedFilename()).toMatch(/\.pdf$/);
      }
    } finally {
      await browser.close();
    }
  });
}

it('says plainly when the link has been withdrawn', async () => {
  await delivered.link.update({ revokedAt: new Date() });
  const browser = await launchBrowser(PHONE);
  try {
    const page = await browser.newPage();
    await page.goto(`${BASE_URL}/s/${delivered.token}`);
    await page.getByText(/withdrawn by the sender/).waitFor();
    expect(await page.getByText(delivered.job.claimReference).count()).toBe(0);
    await screenshot(page, 'share-withdrawn-390x844');
  } finally {
    await browser.close();
  }
});
