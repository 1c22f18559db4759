// Local stand-in for a hosted SMTP relay: speaks real SMTP on loopback, keeps every message it
// receives on disk, and lists them over a small JSON endpoint for the Mailbox screen and tests.
import fs from 'node:fs';
import http from 'node:http';
import path from 'node:path';

import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

const smtpPort = Number(process.env.SMTP_PORT ?? 2525);
const mailboxPort = Number(new URL(process.env.MAILBOX_URL ?? 'http://127.0.0.1:2580').port);
const store = path.join(process.env.DATA_DIR ?? '.data', 'mail', String(smtpPort));
fs.mkdirSync(store, { recursive: true });

type StoredMessage = {
  id: string;
  receivedAt: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string;
  messageId: string | null;
};

const smtp = new SMTPServer({
  authOptional: true,
  disabledCommands: ['STARTTLS'],
  onData(stream, session, callback) {
    simpleParser(stream)
      .then((mail) => {
        const id = `${Date.now()}-${Math.random().toString(36).slice(2, 8)}`;
        const message: StoredMessage = {
          id,
          receivedAt: new Date().toISOString(),
          from: session.envelope.mailFrom ? session.envelope.mailFrom.address : '',
          to: session.envelope.rcptTo.map((r) => r.address),
          subject: mail.subject ?? '',
          text: mail.text ?? '',
          html: typeof mail.html === 'string' ? mail.html : '',
          messageId: mail.messageId ?? null,
        };
        fs.writeFileSync(path.join(store, `${id}.json`), JSON.stringify(message));
        callback();
      })
      .catch(callback);
  },
});
smtp.listen(smtpPort, '127.0.0.1', () => console.log(`fake SMTP on 127.0.0.1:${smtpPort}`));

function readAll(): StoredMessage[] {
  return fs
    .readdirSync(store)
    .filter((f) => f.endsWith('.json'))
    .map((f) => JSON.parse(fs.readFileSync(path.join(store, f), 'utf8')) as StoredMessage)
    .sort((a, b) => b.receivedAt.localeCompare(a.receivedAt));
}

http
  .createServer((req, res) => {
    if (req.url === '/messages' && req.method === 'GET') {
      res.writeHead(200, { 'content-type': 'application/json' });
      res.end(JSON.stringify(readAll()));
      return;
    }
    if (req.url === '/messages' && req.method === 'DELETE') {
      for (const f of fs.readdirSync(store)) fs.unlinkSync(path.join(store, f));
      res.writeHead(204).end();
      return;
    }
    res.writeHead(404).end();
  })
  .listen(mailboxPort, '127.0.0.1', () => console.log(`fake mailbox on 127.0.0.1:${mailboxPort}`));

const stop = () => {
  smtp.close(() => process.exit(0));
};
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
