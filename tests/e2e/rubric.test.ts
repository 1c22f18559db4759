// A manager edits the rubric in the form; saving makes a new version.
import { DEMO_PASSWORD } from '../../seeders/data/demo-people';
import { BASE_URL, DESKTOP, launchBrowser, screenshot, signIn } from '../helpers/browser';
import { demoPerson } from '../helpers/e2e-api';

jest.setTimeout(90_000);

it('saves an edited rubric as the next version and keeps the history', async () => {
  const browser = await launchBrowser(DESKTOP);
  try {
    const page = await browser.newPage();
    await signIn(page, demoPerson('mara.').email, DEMO_PASSWORD);
    await page.waitForURL(`${BASE_URL}/trends`);
    await page.goto(`${BASE_URL}/rubric`);
    await page.getByText('Weights add up to 100 (must be 100)').waitFor();

    // A weight that breaks the sum of 100 is shown in words and blocks saving.
    const weight = page.getByLabel('Weight').first();
    await weight.fill('19');
    await page.getByText('Weights add up to 101 (must be 100)').waitFor();
    expect(await page.getByRole('button', { name: 'Save as a new version' }).isDisabled()).toBe(true);
    await weight.fill('18');

    await page.getByLabel('Pass mark (0 to 100)').fill('86');
    await page.getByRole('button', { name: 'Save as a new version' }).click();
    const saved = await page.getByText(/^Saved as version (\d+)\.$/).textContent();
    const version = Number(/(\d+)/.exec(saved!)![1]);
    expect(version).toBeGreaterThan(1);
    await page.getByText(new RegExp(`Current: version ${version},`)).waitFor();
    await page.getByText(/Earlier versions: .*v1 /).waitFor();
    await screenshot(page, 'rubric-saved-desktop');

    // Put the pass mark back for anyone using the demo afterwards.
    await page.getByLabel('Pass mark (0 to 100)').fill('85');
    await page.getByRole('button', { name: 'Save as a new version' }).click();
    await page.getByText(`Saved as version ${version + 1}.`).waitFor();
  } finally {
    await browser.close();
  }
});
