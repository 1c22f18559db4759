// WCAG 2.1 AA, checked by axe-core on every main screen, for every role, on a phone and a
// desktop. Serious and critical violations fail the test; moderate ones are listed.
import type { BrowserContext, Page } from 'playwright-core';

import { DEMO_PASSWORD } from '../../seeders/data/demo-people';
import { audit, describeViolations } from '../helpers/axe';
import { BASE_URL, DESKTOP, launchBrowser, PHONE, signIn } from '../helpers/browser';
import { demoPerson } from '../helpers/e2e-api';

jest.setTimeout(300_000);

type Visit = { path: string | ((page: Page) => Promise<string>); ready: string | RegExp };

// Detail screens are audited on real demo data: the first fitting job the API lists.
const firstJob = (statuses: string) => async (page: Page) => {
  const { jobs } = await page.evaluate(async (q) => (await fetch(`/api/jobs?status=${q}`)).json(), statuses);
  return `/jobs/${jobs[0].id}`;
};
const firstQueued = async (page: Page) => {
  const queue = await page.evaluate(async () => (await fetch('/api/queue')).json());
  return `/queue/${queue.rows[0].id}`;
};

const SCREENS: Record<string, { who: string; visits: Record<string, Visit> }> = {
  technician: {
    who: 'tess.',
    visits: {
      'my jobs': { path: '/jobs', ready: 'My jobs' },
      'job and capture record': { path: firstJob('draft,rework_requested'), ready: /^Job / },
      'visit plan': { path: async (page) => `${await firstJob('draft,rework_requested')(page)}/plan`, ready: /^Step 1 of 6/ },
      'my quality': { path: '/trends/mine', ready: /quality/i },
      notifications: { path: '/notifications', ready: 'Notifications' },
    },
  },
  reviewer: {
    who: 'ravi.',
    visits: {
      queue: { path: '/queue', ready: /Queue/ },
      'scoring workspace': { path: firstQueued, ready: /Review / },
      notifications: { path: '/notifications', ready: 'Notifications' },
    },
  },
  manager: {
    who: 'mara.',
    visits: {
      trends: { path: '/trends', ready: /Trends/ },
      jobs: { path: '/jobs', ready: /Jobs/ },
      'new job': { path: '/jobs/new', ready: 'New job' },
      rubric: { path: '/rubric', ready: /Rubric/ },
      'kit and timing': { path: '/kit', ready: 'Kit and timing' },
    },
  },
  admin: {
    who: 'alex.',
    visits: {
      users: { path: '/admin/users', ready: /Users/ },
      mailbox: { path: '/mailbox', ready: /Mailbox/ },
    },
  },
};

for (const [size, viewport] of [
  ['phone 390 × 844', PHONE],
  ['desktop 1440 × 900', DESKTOP],
] as const) {
  describe(`accessibility on a ${size}`, () => {
    let browser: BrowserContext;
    beforeAll(async () => {
      browser = await launchBrowser(viewport, { bypassCSP: true });
    });
    afterAll(() => browser.close());

    it('has no serious or critical violations on the sign-in screen', async () => {
      const page = await browser.newPage();
      await page.goto(`${BASE_URL}/sign-in`);
      await page.getByRole('button', { name: 'Sign in' }).waitFor();
      const violations = await audit(page);
      const report = describeViolations('sign-in', violations);
      if (report) console.log(report);
      expect(violations.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => v.id)).toEqual([]);
      await page.close();
    });

    for (const [role, { who, visits }] of Object.entries(SCREENS)) {
      it(`has no serious or critical violations on the ${role}'s screens`, async () => {
        await browser.clearCookies();
        const page = await browser.newPage();
        await signIn(page, demoPerson(who).email, DEMO_PASSWORD);
        await page.waitForURL((url) => !url.pathname.endsWith('/sign-in'));
        const failures: string[] = [];
        for (const [name, visit] of Object.entries(visits)) {
          const path = typeof visit.path === 'string' ? visit.path : await visit.path(page);
          await page.goto(`${BASE_URL}${path}`);
          await page.getByRole('heading', { name: visit.ready }).first().waitFor();
          await page.waitForTimeout(300);
          const violations = await audit(page);
          const report = describeViolations(`${role} ${name}`, violations);
          if (report) console.log(report);
          failures.push(...violations.filter((v) => v.impact === 'serious' || v.impact === 'critical').map((v) => `${name}: ${v.id}`));
        }
        await page.close();
        expect(failures).toEqual([]);
      });
    }
  });
}
