import { randomUUID } from 'node:crypto';

import express, { type Router } from 'express';
import Handlebars from 'handlebars';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';

import { idParam } from './params';

// A local inbox for the demo and the tests: an SMTP server on loopback that keeps what it receives.
export interface CaughtMail {
  id: string;
  from: string;
  to: string[];
  subject: string;
  text: string;
  html: string | null;
  date: string;
  attachments: { filename: string; contentType: string; size: number; content: Buffer }[];
}

export interface MailFake {
  port: number;
  messages: CaughtMail[];
  close: () => Promise<void>;
}

const MAX_KEPT = 200;

export async function startMailFake(port: number): Promise<MailFake> {
  const messages: CaughtMail[] = [];
  const server = new SMTPServer({
    disabledCommands: ['STARTTLS'],
    authOptional: true,
    size: 25 * 1024 * 1024,
    logger: false,
    onData(stream, session, callback) {
      simpleParser(stream)
        .then((parsed) => {
          messages.unshift({
            id: randomUUID(),
            from: parsed.from?.text ?? '',
            to: session.envelope.rcptTo.map((r) => r.address),
            subject: parsed.subject ?? '',
            text: parsed.text ?? '',
            html: typeof parsed.html === 'string' ? parsed.html : null,
            date: (parsed.date ?? new Date()).toISOString(),
            attachments: parsed.attachments.map((a) => ({ filename: a.filename ?? 'attachment', contentType: a.contentType, size: a.size, content: a.content })),
          });
          messages.length = Math.min(messages.length, MAX_KEPT);
          callback();
        })
        .catch(callback);
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => resolve());
  });
  const address = server.server.address();
  return {
    port: typeof address === 'object' && address ? address.port : port,
    messages,
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}

const PAGE = Handlebars.compile(`<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>Feltwire demo inbox</title><style>
body{font-family:system-ui,sans-serif;margin:0;background:#f6f1e7;color:#1d1a16}main{max-width:860px;margin:0 auto;padding:16px}
h1{font-size:1.6rem}.note{color:#4a4238}article{background:#fffdf7;border:1px solid #d8cfbf;border-radius:10px;padding:14px;margin:12px 0}
h2{font-size:1.1rem;margin:0 0 6px}pre{white-space:pre-wrap;font-family:inherit}a{color:#1f3a34}
</style></head><body><main><h1>Demo inbox</h1><p class="note">Every e-mail Feltwire sent while running locally. Nothing here left this machine.</p>
{{#unless messages.length}}<p>No e-mail yet.</p>{{/unless}}
{{#each messages}}<article data-testid="inbox-message"><h2>{{subject}}</h2><p class="note">To {{#each to}}{{this}} {{/each}}· {{date}}</p><pre>{{text}}</pre>
{{#each attachments}}<p><a href="/dev/inbox/{{../id}}/attachments/{{@index}}" data-testid="inbox-attachment">{{filename}}</a> ({{size}} bytes)</p>{{/each}}</article>{{/each}}
</main></body></html>`);

export function inboxRouter(fake: MailFake): Router {
  const router = express.Router();
  router.get('/inbox', (_req, res) => {
    res.type('html').send(PAGE({ messages: fake.messages }));
  });
  router.get('/inbox.json', (_req, res) => {
    res.json(fake.messages.map(({ attachments, ...m }) => ({ ...m, attachments: attachments.map(({ content: _c, ...a }) => a) })));
  });
  router.get('/inbox/:id/attachments/:n', (req, res) => {
    const attachment = fake.messages.find((m) => m.id === req.params.id)?.attachments[idParam(req.params.n, 'n', 0)];
    if (!attachment) {
      res.status(404).json({ error: 'Not found.' });
      return;
    }
    res.type(attachment.contentType).setHeader('Content-Disposition', `attachment; filename="${attachment.filename.replace(/"/g, '')}"`);
    res.send(attachment.content);
  });
  return router;
}
