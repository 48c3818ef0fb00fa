import nodemailer from 'nodemailer';

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
