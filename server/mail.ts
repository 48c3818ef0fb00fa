import nodemailer from 'nodemailer';

import type { QueuedMail } from '@/modules/jobs/core/job-kinds';
import { JobFailure } from '@/modules/jobs/server/queue';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
}

// nodemailer over SMTP: the local mail fake in development and tests, a real relay in production.
export function smtpMailer(opts: { host: string; port: number; from: string; secure?: boolean; user?: string; pass?: string }): Mailer {
  const transport = nodemailer.createTransport({
    host: opts.host,
    port: opts.port,
    secure: opts.secure ?? false,
    ignoreTLS: !opts.secure && opts.host === '127.0.0.1',
    ...(opts.user ? { auth: { user: opts.user, pass: opts.pass ?? '' } } : {}),
  });
  return {
    async send(mail) {
      await transport.sendMail({ from: opts.from, ...mail });
    },
  };
}

/** The e-mail job: attachments are read back from object storage, then the mail goes out. */
export async function sendQueuedMail(mailer: Mailer, files: { get: (key: string) => Promise<Buffer> }, mail: QueuedMail): Promise<void> {
  const attachments = await Promise.all(
    (mail.attachments ?? []).map(async (a) => {
      try {
        return { filename: a.filename, contentType: a.contentType, content: await files.get(a.objectKey) };
      } catch (err) {
        throw new JobFailure(`The attachment ${a.filename} could not be read from storage: ${(err as Error).message}`);
      }
    }),
  );
  try {
    await mailer.send({ to: mail.to, subject: mail.subject, text: mail.text, ...(attachments.length ? { attachments } : {}) });
  } catch (err) {
    throw new JobFailure(`The mail server did not take the e-mail to ${mail.to}: ${(err as Error).message}`);
  }
}
