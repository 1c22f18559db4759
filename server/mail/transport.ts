// The SMTP side of e-mail: a nodemailer transport and one send. Knows nothing of the database.
import nodemailer, { type Transporter } from 'nodemailer';

import { config } from '../config';

export type OutgoingEmail = { id: number; to: string[]; subject: string; text: string; html: string };

export function createTransport(port = config.smtp.port, host = config.smtp.host): Transporter {
  return nodemailer.createTransport({
    host,
    port,
    secure: false,
    ignoreTLS: true,
    connectionTimeout: 5000,
    greetingTimeout: 5000,
    socketTimeout: 10_000,
  });
}

// The Message-ID is derived from the outbox row, so a message sent again is recognisably the same.
export async function deliver(transport: Transporter, email: OutgoingEmail) {
  await transport.sendMail({
    from: config.smtp.from,
    to: email.to,
    subject: email.subject,
    text: email.text,
    html: email.html,
    messageId: `<outbox-${email.id}@sightline.invalid>`,
  });
}
