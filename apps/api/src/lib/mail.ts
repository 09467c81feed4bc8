import nodemailer from 'nodemailer';
import type { Config } from '../config/env';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
  attachments?: Array<{ filename: string; content: Buffer; contentType: string }>;
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
  close(): void;
}

/** SMTP through nodemailer: the local fake in development and tests, a real provider by configuration. */
export function createSmtpMailer(smtp: Config['smtp']): Mailer {
  const transport = nodemailer.createTransport({
    host: smtp.host,
    port: smtp.port,
    secure: smtp.secure,
    ignoreTLS: !smtp.secure && (smtp.host === '127.0.0.1' || smtp.host === 'localhost'),
    auth: smtp.user ? { user: smtp.user, pass: smtp.pass ?? '' } : undefined,
    pool: true,
    maxConnections: 2,
  });
  return {
    async send(mail) {
      await transport.sendMail({ from: smtp.from, ...mail });
    },
    close: () => transport.close(),
  };
}
