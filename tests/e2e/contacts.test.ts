// Claim contacts: the manager corrects them on the job page (a bad e-mail is named and
// nothing is saved), and the technician reads them on a phone with a dialable number.
import { DEMO_PASSWORD } from '../../seeders/data/demo-people';
import { BASE_URL, DESKTOP, launchBrowser, PHONE, screenshot, signIn } from '../helpers/browser';
import { demoPerson, draftJob } from '../helpers/e2e-api';

jest.setTimeout(120_000);

it('lets a manager edit the contacts and shows them to the technician with a tel: link', async () => {
  const setup = await launchBrowser(DESKTOP);
  const jobId = await draftJob(setup.request, { technician: 'tess.', claimReference: `MRK-CT-${Date.now() % 100000}`, dueInHours: 30 });
  await setup.close();

  const desk = await launchBrowser(DESKTOP);
  try {
    const page = await desk.newPage();
    await signIn(page, demoPerson('mara.').email, DEMO_PASSWORD);
    await page.waitForURL(/\/trends|\/jobs|\/queue/);
    await page.goto(`${BASE_URL}/jobs/${jobId}`);
    await page.getByRole('button', { name: 'Edit contacts' }).click();
    await page.getByLabel("Desk adjuster's e-mail").fill('not an address');
    await page.getByLabel("Policyholder's phone").fill('+1 555 010 2299');
    await page.getByLabel('Site access notes').fill('Key under the blue pot. Cat indoors.');
    await page.getByRole('button', { name: 'Save contacts' }).click();
    await page.getByText('Enter an e-mail address like name@example.com').waitFor();
    await page.getByLabel("Desk adjuster's e-mail").fill('desk.adjuster@carrier.test');
    await page.getByRole('button', { name: 'Save contacts' }).click();
    await page.getByRole('button', { name: 'Edit contacts' }).waitFor();
    await page.getByText('(desk.adjuster@carrier.test)').waitFor();
    await screenshot(page, 'contacts-manager-1440x900');
  } finally {
    await desk.close();
  }

  const phone = await launchBrowser(PHONE);
  try {
    const page = await phone.newPage();
    await signIn(page, demoPerson('tess.').email, DEMO_PASSWORD);
    await page.waitForURL(`${BASE_URL}/jobs`);
    await page.goto(`${BASE_URL}/jobs/${jobId}`);
    const call = page.getByRole('link', { name: 'Call +1 555 010 2299' });
    await call.waitFor();
    expect(await call.getAttribute('href')).toBe('tel:+15550102299');
    await page.getByText('Key under the blue pot. Cat indoors.').waitFor();
    expect(await page.getByRole('button', { name: 'Edit contacts' }).count()).toBe(0);
    await screenshot(page, 'contacts-technician-390x844');
  } finally {
    await phone.close();
  }
});
