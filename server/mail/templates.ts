// Sightline's e-mails, in plain text and HTML, in our own words.
export type Email = { subject: string; text: string; html: string };

const escape = (s: string) => s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

function layout(title: string, paragraphs: string[], items: string[] = [], link?: { url: string; label: string }): string {
  return [
    '<!doctype html><html><body style="font-family:Arial,sans-serif;color:#1B2430;background:#F7F5F0;padding:16px">',
    `<h1 style="font-size:20px;border-bottom:3px solid #B85227;padding-bottom:6px">${escape(title)}</h1>`,
    ...paragraphs.map((p) => `<p>${escape(p)}</p>`),
    items.length ? `<ol>${items.map((i) => `<li style="margin-bottom:8px">${i}</li>`).join('')}</ol>` : '',
    link ? `<p><a href="${escape(link.url)}" style="color:#B85227;font-weight:bold">${escape(link.label)}</a></p>` : '',
    '<p style="color:#636A77;font-size:12px">Sent by Sightline. Reply to your reviewer or manager, not to this address.</p>',
    '</body></html>',
  ].join('');
}

// The reviewer's overall note, as a line of its own in the text and a paragraph in the HTML.
const noteLine = (note: string | null) => (note ? `Note from the reviewer: ${note}` : '');

type JobFacts = { claimReference: string; street: string; city: string; jobUrl: string };
export type ReworkItemFacts = { title: string; instruction: string; stockReason: string | null };

export function reworkRequestEmail(
  job: JobFacts,
  revision: number,
  items: ReworkItemFacts[],
  reworkDueAt: Date,
  reviewerName: string,
  note: string | null = null,
): Email {
  const due = reworkDueAt.toUTCString();
  const subject = `Rework requested: ${job.claimReference}, revision ${revision}`;
  const lines = items.map((item, i) => `${i + 1}. ${item.title}${item.stockReason ? ` (${item.stockReason})` : ''}: ${item.instruction}`);
  const text = [
    `${reviewerName} reviewed revision ${revision} of the capture record for claim ${job.claimReference} (${job.street}, ${job.city}) and asks for rework on ${items.length} item(s):`,
    '',
    ...lines,
    '',
    ...(note ? [noteLine(note), ''] : []),
    `Please answer each item and resubmit by ${due}.`,
    `Open the job: ${job.jobUrl}`,
  ].join('\n');
  const html = layout(
    `Rework requested for ${job.claimReference}`,
    [
      `${reviewerName} reviewed revision ${revision} for ${job.street}, ${job.city} and asks for rework on ${items.length} item(s).`,
      ...(note ? [noteLine(note)] : []),
      `Please answer each item and resubmit by ${due}.`,
    ],
    items.map(
      (item) =>
        `<strong>${escape(item.title)}</strong>${item.stockReason ? ` <em>(${escape(item.stockReason)})</em>` : ''}<br>${escape(item.instruction)}`,
    ),
    { url: job.jobUrl, label: 'Open the job in Sightline' },
  );
  return { subject, text, html };
}

export function acceptedEmail(job: JobFacts, revision: number, score: number | null, note: string | null = null): Email {
  const subject = `Accepted: ${job.claimReference}, revision ${revision}`;
  const scoreText = score === null ? '' : ` with a score of ${score.toFixed(1)}`;
  const text = `Revision ${revision} of the capture record for claim ${job.claimReference} (${job.street}, ${job.city}) was accepted${scoreText}. Thank you.\n\n${note ? `${noteLine(note)}\n\n` : ''}Open the job: ${job.jobUrl}`;
  return {
    subject,
    text,
    html: layout(
      `Accepted: ${job.claimReference}`,
      [`Revision ${revision} for ${job.street}, ${job.city} was accepted${scoreText}. Thank you.`, ...(note ? [noteLine(note)] : [])],
      [],
      { url: job.jobUrl, label: 'Open the job in Sightline' },
    ),
  };
}

export function recaptureEmail(job: JobFacts, revision: number, reasons: ReworkItemFacts[], note: string | null = null): Email {
  const subject = `Recapture required: ${job.claimReference}`;
  const lines = reasons.map((r) => `- ${r.title}: ${r.instruction}`);
  const text = [
    `The capture for claim ${job.claimReference} (${job.street}, ${job.city}), revision ${revision}, cannot be fixed from the office: a new site visit is needed.`,
    '',
    ...lines,
    '',
    ...(note ? [noteLine(note), ''] : []),
    `Open the job: ${job.jobUrl}`,
  ].join('\n');
  return {
    subject,
    text,
    html: layout(
      `Recapture required: ${job.claimReference}`,
      [
        `Revision ${revision} for ${job.street}, ${job.city} cannot be fixed from the office: a new site visit is needed.`,
        ...(note ? [noteLine(note)] : []),
      ],
      reasons.map((r) => `<strong>${escape(r.title)}</strong><br>${escape(r.instruction)}`),
      { url: job.jobUrl, label: 'Open the job in Sightline' },
    ),
  };
}

export function reworkReminderEmail(job: JobFacts, reworkDueAt: Date, open: number): Email {
  const subject = `Reminder: rework overdue for ${job.claimReference}`;
  const text = `The rework for claim ${job.claimReference} (${job.street}, ${job.city}) was due ${reworkDueAt.toUTCString()} and ${open} item(s) are still open. Please answer them and resubmit.\n\nOpen the job: ${job.jobUrl}`;
  return {
    subject,
    text,
    html: layout(
      `Rework overdue: ${job.claimReference}`,
      [`The rework for ${job.street}, ${job.city} was due ${reworkDueAt.toUTCString()}; ${open} item(s) are still open.`],
      [],
      { url: job.jobUrl, label: 'Open the job in Sightline' },
    ),
  };
}

export function invitationEmail(name: string, link: string, expiresAt: Date): Email {
  const subject = 'Your Sightline account';
  const text = `Hello ${name},\n\nAn account has been made for you in Sightline. Choose your password here (the link works once, until ${expiresAt.toUTCString()}):\n\n${link}\n`;
  return {
    subject,
    text,
    html: layout(
      subject,
      [`Hello ${name},`, `An account has been made for you in Sightline. The link works once, until ${expiresAt.toUTCString()}.`],
      [],
      { url: link, label: 'Choose your password' },
    ),
  };
}

export function passwordResetEmail(name: string, link: string, expiresAt: Date): Email {
  const subject = 'Set a new Sightline password';
  const text = `Hello ${name},\n\nSomeone (we hope you) asked to set a new password for your Sightline account. The link works once, until ${expiresAt.toUTCString()}, and also lifts any sign-in lock:\n\n${link}\n\nIf you did not ask, ignore this message: your password stays as it is.\n`;
  return {
    subject,
    text,
    html: layout(
      subject,
      [
        `Hello ${name},`,
        `Someone (we hope you) asked to set a new password. The link works once, until ${expiresAt.toUTCString()}, and also lifts any sign-in lock.`,
        'If you did not ask, ignore this message: your password stays as it is.',
      ],
      [],
      { url: link, label: 'Set a new password' },
    ),
  };
}

// To the desk adjuster on acceptance: a link to the read-only summary, no account needed.
export function deliveryEmail(
  job: { claimReference: string; street: string; city: string; adjusterName: string | null },
  shareUrl: string,
  linkDays: number,
): Email {
  const subject = `Capture ready: ${job.claimReference}, ${job.street}`;
  const greeting = job.adjusterName ? `Dear ${job.adjusterName},` : 'Hello,';
  const body = `The 3D capture of ${job.street}, ${job.city} for claim ${job.claimReference} has passed quality control. The summary (what was captured and what was not, the damage and the stations that view it) is at the link below, with the PDF to download. The link works for ${linkDays} days and needs no account.`;
  return {
    subject,
    text: `${greeting}\n\n${body}\n\n${shareUrl}\n`,
    html: layout(`Capture ready: ${job.claimReference}`, [greeting, body], [], { url: shareUrl, label: 'Open the capture summary' }),
  };
}

// A notification sent by e-mail for a kind that has no e-mail of its own.
export function notificationEmail(text: string, link: string): Email {
  return {
    subject: text,
    text: `${text}\n\nOpen it in Sightline: ${link}\n\nYou get this e-mail because you chose it in Sightline's notification settings.`,
    html: layout(text, ['You get this e-mail because you chose it in your notification settings.'], [], {
      url: link,
      label: 'Open it in Sightline',
    }),
  };
}
