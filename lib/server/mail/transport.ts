import nodemailer, { type Transporter } from 'nodemailer';

/** The sender address on every message (the fake SMTP server accepts anything). */
export const MAIL_FROM = process.env.MAIL_FROM ?? 'Arcline review desk <review@arcline.example>';

let cached: { url: string; transport: Transporter } | null = null;

/**
 * A nodemailer transport for SMTP_URL (any nodemailer transport URL), or null when it is not set: then
 * messages wait in the outbox. TLS is not negotiated on a plain smtp:// URL, as the local fake offers none.
 */
export function mailTransport(): Transporter | null {
  const url = process.env.SMTP_URL;
  if (!url) return null;
  if (cached?.url !== url) {
    const plain = url.startsWith('smtp://');
    cached = { url, transport: nodemailer.createTransport(url, plain ? { secure: false, ignoreTLS: true } : {}) };
  }
  return cached.transport;
}

/** Links in e-mails point here. */
export const appBaseUrl = () => (process.env.APP_URL ?? process.env.NEXTAUTH_URL ?? 'http://localhost:3000').replace(/\/$/, '');
