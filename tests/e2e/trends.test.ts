// Managers read the team's trends on a desktop and glance at them on a phone; a technician
// sees only their own.
import { DEMO_PASSWORD } from '../../seeders/data/demo-people';
import { BASE_URL, DESKTOP, launchBrowser, PHONE, screenshot, signIn } from '../helpers/browser';
import { demoPerson } from '../helpers/e2e-api';

jest.setTimeout(120_000);

for (const [label, viewport] of [
  ['desktop', DESKTOP],
  ['phone', PHONE],
] as const) {
  it(`shows the manager the team's trends on a ${label}`, async () => {
    const browser = await launchBrowser(viewport);
    try {
      const page = await browser.newPage();
      await signIn(page, demoPerson('mara.').email, DEMO_PASSWORD);
      await page.waitForURL(`${BASE_URL}/trends`);
      await page.getByRole('heading', { name: 'Mean score per week' }).waitFor();
      await page
        .getByText(/^Summary: \d+ week\(s\); highest/)
        .first()
        .waitFor();
      await page
        .getByText(/First-pass yield/)
        .first()
        .waitFor();
      const table = page.getByRole('table', { name: 'Technicians compared' });
      await table
        .getByRole('row')
        .filter({ hasText: demoPerson('mateo.').name })
        .waitFor();
      await screenshot(page, `trends-${label}`);

      await table
        .getByRole('row')
        .filter({ hasText: demoPerson('jonah.').name })
        .click();
      await page.getByRole('heading', { name: `Trends: ${demoPerson('jonah.').name}` }).waitFor();
      await page.getByRole('heading', { name: 'Most frequent shortfalls' }).waitFor();
      await screenshot(page, `trends-technician-${label}`);
    } finally {
      await browser.close();
    }
  });
}

it('shows a technician only their own quality', async () => {
  const browser = await launchBrowser(PHONE);
  try {
    const page = await browser.newPage();
    await signIn(page, demoPerson('mateo.').email, DEMO_PASSWORD);
    await page.waitForURL(`${BASE_URL}/jobs`);
    await page.getByRole('link', { name: 'My quality' }).click();
    await page.getByRole('heading', { name: 'My quality' }).waitFor();
    await page.getByText('Reflective surfaces and glazing flagged', { exact: false }).first().waitFor();
    await screenshot(page, 'my-quality-phone');
  } finally {
    await browser.close();
  }
});
