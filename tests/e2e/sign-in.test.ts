import type { BrowserContext } from 'playwright-core';

import { DEMO_PASSWORD, DEMO_PEOPLE } from '../../seeders/data/demo-people';
import { homeFor } from '../../shared/navigation';
import { ROLE_LABELS, ROLES } from '../../shared/roles';
import { BASE_URL, DESKTOP, launchBrowser, PHONE, screenshot, signIn } from '../helpers/browser';

jest.setTimeout(60_000);

const HOME_TITLE = { technician: 'My jobs', reviewer: 'Queue', manager: 'Trends', admin: 'Users' } as const;

for (const [label, viewport] of [
  ['phone', PHONE],
  ['desktop', DESKTOP],
] as const) {
  describe(`signing in on a ${label} (${viewport.width}x${viewport.height})`, () => {
    let browser: BrowserContext;
    beforeAll(async () => {
      browser = await launchBrowser(viewport);
    });
    afterAll(() => browser.close());

    for (const role of ROLES) {
      it(`lands a ${role} on their home page`, async () => {
        const person = DEMO_PEOPLE.find((p) => p.role === role)!;
        const page = await browser.newPage();
        await signIn(page, person.email, DEMO_PASSWORD);
        await page.waitForURL(`${BASE_URL}${homeFor(role)}`);
        await page.getByRole('heading', { level: 1, name: HOME_TITLE[role] }).waitFor();
        await page.getByText(ROLE_LABELS[role], { exact: true }).first().waitFor();
        await screenshot(page, `home-${role}-${label}`);
        await page.getByRole('button', { name: 'Sign out' }).click();
        await page.getByRole('button', { name: 'Sign in' }).waitFor();
        await page.close();
      });
    }

    it('shows the server message for a wrong password', async () => {
      const page = await browser.newPage();
      // An account no other browser test signs in with, so its failure count stays its own.
      await signIn(page, DEMO_PEOPLE[5].email, 'not-the-password');
      await page.getByText('That e-mail and password do not match an active account.').waitFor();
      await screenshot(page, `sign-in-refused-${label}`);
      await page.close();
    });
  });
}
