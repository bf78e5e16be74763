import nodemailer from 'nodemailer';
import type { Env } from '../../config/env.js';

/** SMTP settings: the local catcher on 127.0.0.1:2525 by default, any provider through the environment. */
export interface SmtpSettings {
  host: string;
  port: number;
  secure: boolean;
  user?: string;
  pass?: string;
  from: string;
}

export function smtpFromEnv(env: Pick<Env, 'SMTP_HOST' | 'SMTP_PORT' | 'SMTP_SECURE' | 'SMTP_USER' | 'SMTP_PASS' | 'MAIL_FROM'>): SmtpSettings {
  return {
    host: env.SMTP_HOST,
    port: env.SMTP_PORT,
    secure: env.SMTP_SECURE === 'true',
    user: env.SMTP_USER,
    pass: env.SMTP_PASS,
    from: env.MAIL_FROM,
  };
}

export function isLoopback(host: string): boolean {
  return host === '127.0.0.1' || host === 'localhost' || host === '::1';
}

export interface OutgoingMail {
  from: string;
  to: string;
  subject: string;
  text: string;
  html?: string;
  /** `<idempotencyKey@trayline>`: the same for every attempt of one outbox row. */
  messageId: string;
  headers?: Record<string, string>;
  attachments: { filename: string; content: Buffer; contentType: string }[];
}

/** Sends one message; resolves once the SMTP server accepted it (250 after DATA). */
export type MailSender = (mail: OutgoingMail) => Promise<void>;

export function smtpSender(s: SmtpSettings): MailSender {
  // One connection per message (no pool): nothing kept between jobs, and a stopped server is seen at once.
  const transport = nodemailer.createTransport({
    host: s.host,
    port: s.port,
    secure: s.secure,
    auth: s.user ? { user: s.user, pass: s.pass ?? '' } : undefined,
    // The loopback catcher speaks plain SMTP; a real provider negotiates STARTTLS when it offers it.
    ignoreTLS: isLoopback(s.host) && !s.secure,
    connectionTimeout: 10_000,
    greetingTimeout: 10_000,
    socketTimeout: 60_000,
  });
  return async (mail) => {
    await transport.sendMail(mail);
  };
}
