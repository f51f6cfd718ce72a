/**
 * Sends e-mail through SMTP with nodemailer (settings in config.smtp). In
 * development and tests the SMTP server is the local fake one
 * (server/mail/fake-smtp.ts), which stores each message instead of sending it.
 *
 * Example: await sendMail({ to: 'tech@example.test', ...inviteMessage(details) })
 */
import nodemailer, { type Transporter } from 'nodemailer';
import { config } from '@/server/config';

export type OutgoingMail = {
  to: string;
  subject: string;
  text: string;
  html: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
};

let transport: Transporter | null = null;

function getTransport(): Transporter {
  if (!transport) {
    const { host, port, secure, user, password } = config.smtp;
    transport = nodemailer.createTransport({
      host,
      port,
      secure,
      auth: user ? { user, pass: password } : undefined,
      connectionTimeout: 10_000,
      greetingTimeout: 10_000,
      socketTimeout: 20_000,
    });
  }
  return transport;
}

/** Sends one message; resolves when the SMTP server has accepted it. */
export async function sendMail(mail: OutgoingMail): Promise<void> {
  await getTransport().sendMail({ from: config.smtp.from, ...mail });
}

/**
 * Sends without waiting (the answer must not depend on whether mail went out,
 * e.g. password reset); a failure is logged, never thrown.
 */
export function sendMailInBackground(mail: OutgoingMail): void {
  sendMail(mail).catch((err) => {
    console.error(`E-mail to ${mail.to} could not be sent: ${err instanceof Error ? err.message : err}`);
  });
}
