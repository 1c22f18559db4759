// The loop that saves a second site visit: rework requested by e-mail, answered on a phone,
// resubmitted, reviewed against the diff, accepted, and the acceptance e-mailed.
import type { BrowserContext, Page } from 'playwright-core';

import { DEMO_PASSWORD } from '../../seeders/data/demo-people';
import { BASE_URL, DESKTOP, launchBrowser, PHONE, screenshot, signIn } from '../helpers/browser';
import { demoPerson, submittedJob } from '../helpers/e2e-api';
import { completeRecord } from '../helpers/records';

jest.setTimeout(180_000);

const claimReference = `E2E-L-${Date.now().toString(36).toUpperCase()}`;
const contexts: BrowserContext[] = [];
let jobId: number;

async function open(viewport: { width: number; height: number }, emailStart: string): Promise<Page> {
  const context = await launchBrowser(viewport);
  contexts.push(context);
  const page = await context.newPage();
  await signIn(page, demoPerson(emailStart).email, DEMO_PASSWORD);
  await page.waitForURL((url) => !url.pathname.endsWith('/sign-in'));
  return page;
}

async function pressAll(page: Page, keys: string[]) {
  for (const key of keys) await page.keyboard.press(key);
}

async function waitForMail(page: Page, subject: string) {
  await page.goto(`${BASE_URL}/mailbox`);
  // The outbox worker sends within seconds; the mailbox refreshes itself.
  await page.getByRole('listitem', { name: `Open message ${subject}` }).waitFor({ timeout: 60_000 });
  await page.getByRole('listitem', { name: `Open message ${subject}` }).click();
  await page.getByRole('heading', { name: subject }).waitFor();
}

beforeAll(async () => {
  const setup = await launchBrowser(DESKTOP);
  contexts.push(setup);
  jobId = await submittedJob(setup.request, {
    technician: 'wren.',
    claimReference,
    dueInHours: 0.5,
    record: completeRecord(),
    lossType: 'smoke',
  });
});

afterAll(async () => {
  for (const context of contexts) await context.close();
});

it('runs rework → e-mail → answers → resubmission → diff → acceptance e-mail', async () => {
  // Reviewer, desktop: claim and request rework on two items.
  const reviewer = await open(DESKTOP, 'ravi.');
  await reviewer.goto(`${BASE_URL}/queue/${jobId}`);
  await reviewer.getByRole('button', { name: 'Claim to score' }).click();
  await reviewer.getByText(/You hold the claim/).waitFor();
  await pressAll(reviewer, ['2', 'j', '4', 'j', '3', 'j', 'j', 'j', '4', 'j', 'j', 'j', 'p', 'j', '4']);
  await reviewer.getByLabel('Comment for Coverage completeness').fill('The attic is missing: capture it from the hatch.');
  await reviewer
    .getByLabel('Comment for Station spacing and doorway line of sight')
    .fill('Add a doorway station between the hall and the kitchen.');
  await reviewer.getByRole('radiogroup', { name: 'Decision' }).getByRole('radio', { name: 'Request rework' }).click();
  await reviewer.getByRole('button', { name: 'Record decision' }).click();
  await reviewer.getByRole('region', { name: 'Decision recorded' }).waitFor();

  // Admin, desktop: the rework request is in the mailbox.
  const admin = await open(DESKTOP, 'alex.');
  await waitForMail(admin, `Rework requested: ${claimReference}, revision 1`);
  await admin
    .getByText(/The attic is missing: capture it from the hatch\./)
    .first()
    .waitFor();
  await screenshot(admin, 'mailbox-rework-request-desktop');

  // Technician, phone: answer both items, correct the record, resubmit.
  const technician = await open(PHONE, 'wren.');
  // The technician's bell has the rework request; its link opens the job.
  await technician.getByRole('link', { name: /^Notifications, [1-9]\d* unread$/ }).click();
  await technician.waitForURL(/\/notifications$/);
  const notice = technician.getByRole('listitem').filter({ hasText: `Rework requested on ${claimReference}` });
  await notice.getByText(/^Unread/).waitFor();
  await screenshot(technician, 'notifications-phone');
  await notice.getByRole('link', { name: 'Open the job' }).click();
  await technician.waitForURL(`${BASE_URL}/jobs/${jobId}`);
  await technician.getByRole('heading', { name: 'Rework requested' }).waitFor();
  // The rework deadline is on the job page, in words.
  await technician.getByText(/^Rework due in \d+ (hours?|days?|minutes?)/).waitFor();
  for (const [n, note] of [
    [1, 'Captured the attic from the hatch: 3 stations.'],
    [2, 'Added a station in the hall doorway.'],
  ] as const) {
    await technician
      .getByRole('radiogroup', { name: `Your answer to item ${n}` })
      .getByRole('radio', { name: 'Fixed' })
      .click();
    await technician.getByLabel(`What you did, or why (item ${n})`).fill(note);
    await technician.getByRole('button', { name: `Save answer ${n}` }).click();
    await technician
      .getByText(`Answered: Fixed`)
      .nth(n - 1)
      .waitFor();
  }
  // The processing confirmation made for revision 1 does not carry over: it is asked again.
  // (The Processing section is open by default.)
  const processing = technician.getByRole('checkbox', { name: /started processing on the capture platform/ });
  await expect(processing.getAttribute('aria-checked')).resolves.toBe('false');
  await technician.getByText('Your confirmation was for the last revision: confirm again for this one.').waitFor();
  await processing.click();
  await technician.getByRole('button', { name: /^Notes.*Show/ }).click();
  await technician.getByLabel('Notes for the reviewer').fill('Attic and hall doorway added as asked.');
  await technician.getByText(/^Saved \d/).waitFor();
  await screenshot(technician, 'rework-answered-phone');
  await technician.getByRole('button', { name: 'Submit revision 2' }).click();
  await technician.getByText(/Resubmitted\. Latest: revision 2/).waitFor();
  await screenshot(technician, 'resubmitted-phone');

  // Reviewer: the bell tells of the resubmission; then the diff and the answers in the form's
  // words, carried-over scores, then accept.
  await reviewer.goto(`${BASE_URL}/notifications`);
  await reviewer
    .getByRole('listitem')
    .filter({ hasText: `Resubmitted for review: ${claimReference}, revision 2` })
    .waitFor();
  await reviewer.goto(`${BASE_URL}/queue/${jobId}`);
  await reviewer.getByRole('button', { name: 'Claim to score' }).click();
  await reviewer.getByText('Resubmission: revision 1 → 2').waitFor();
  await reviewer.getByText('Answer: Captured the attic from the hatch: 3 stations.').waitFor();
  const changes = reviewer.getByRole('group', { name: 'Changes in Notes' });
  await changes.getByText('Notes for the reviewer: was —, now Attic and hall doorway added as asked.').waitFor();
  // No internal field names in what changed (the texts are printed if one slips in).
  const leaked = await reviewer
    .getByRole('group', { name: /^Changes in / })
    .getByText(/\brooms\.\d|totalStations|"kind"/)
    .allTextContents();
  expect(leaked).toEqual([]);
  await reviewer
    .getByText(/Carried over from revision 1/)
    .first()
    .waitFor();
  // Processing was confirmed anew for revision 2, so it is scored again ('p'), not carried.
  await pressAll(reviewer, ['4', 'j', 'j', '4', 'j', 'j', 'j', 'j', 'j', 'j', 'p', 'j', '4']);
  await reviewer.getByText('100.0', { exact: true }).waitFor();
  await screenshot(reviewer, 'resubmission-review-desktop');
  await reviewer.getByRole('radiogroup', { name: 'Decision' }).getByRole('radio', { name: 'Accept' }).click();
  await reviewer.getByRole('button', { name: 'Record decision' }).click();
  await reviewer.getByRole('region', { name: 'Decision recorded' }).waitFor();

  // The acceptance e-mail arrives.
  await waitForMail(admin, `Accepted: ${claimReference}, revision 2`);
  await screenshot(admin, 'mailbox-accepted-desktop');
});
