/**
 * The fake SMTP service's mailbox on disk: one JSON file per received message
 * in a folder (MAIL_DIR, default .data/mail). Files are written to a temporary
 * name and renamed, so a reader in another process never sees half a message.
 * Read by the development mail reader and by the API and browser tests.
 *
 * Example: const [latest] = listMail(config.mailDir, { to: 'tech@example.test' });
 *          readMail(config.mailDir, latest.id)?.text → 'Marit Oakhollow has shared …'
 */
import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { mailIdSchema, type MailLink, type MailMessage, type MailSummary } from '@/shared/dev-mail';
import type { ParsedMessage } from './mime';

/** A message as stored: the parsed message plus its envelope and attachments (base64). */
export type StoredMail = {
  id: string;
  receivedAt: string;
  envelopeFrom: string;
  envelopeTo: string[];
  subject: string;
  from: string;
  to: string;
  text: string | null;
  html: string | null;
  attachments: { filename: string; contentType: string; sizeBytes: number; contentBase64: string }[];
};

function newId(at: Date): string {
  // 2027-01-01T12:00:00.000Z → 20270101T120000000Z (sorts by time as text)
  const stamp = at.toISOString().replace(/[-:.]/g, '');
  return `${stamp}-${crypto.randomBytes(6).toString('hex')}`;
}

/** Stores one received message; returns its id. */
export function saveMail(dir: string, envelope: { from: string; to: string[] }, message: ParsedMessage, at = new Date()): string {
  fs.mkdirSync(dir, { recursive: true });
  const id = newId(at);
  const stored: StoredMail = {
    id,
    receivedAt: at.toISOString(),
    envelopeFrom: envelope.from,
    envelopeTo: envelope.to.map((address) => address.toLowerCase()),
    subject: message.subject,
    from: message.from,
    to: message.to,
    text: message.text,
    html: message.html,
    attachments: message.attachments.map((a) => ({
      filename: a.filename,
      contentType: a.contentType,
      sizeBytes: a.content.length,
      contentBase64: a.content.toString('base64'),
    })),
  };
  const file = path.join(dir, `${id}.json`);
  const temp = `${file}.${process.pid}.tmp`;
  fs.writeFileSync(temp, JSON.stringify(stored));
  fs.renameSync(temp, file);
  return id;
}

function summary(mail: StoredMail): MailSummary {
  return { id: mail.id, receivedAt: mail.receivedAt, to: mail.envelopeTo, subject: mail.subject, attachmentCount: mail.attachments.length };
}

/** Reads one stored message, or null when there is none with that id. */
export function readStoredMail(dir: string, id: string): StoredMail | null {
  if (!mailIdSchema.safeParse(id).success) return null;
  try {
    return JSON.parse(fs.readFileSync(path.join(dir, `${id}.json`), 'utf8')) as StoredMail;
  } catch {
    return null;
  }
}

/** Every stored message (newest first), optionally only those sent to `to`. */
export function listStoredMail(dir: string, { to }: { to?: string } = {}): StoredMail[] {
  let names: string[];
  try {
    names = fs.readdirSync(dir).filter((name) => name.endsWith('.json'));
  } catch {
    return [];
  }
  names.sort().reverse();
  const wanted = to?.toLowerCase();
  const out: StoredMail[] = [];
  for (const name of names) {
    const mail = readStoredMail(dir, name.slice(0, -'.json'.length));
    if (mail && (!wanted || mail.envelopeTo.includes(wanted))) out.push(mail);
  }
  return out;
}

/** Summaries for the mail reader's list, newest first, at most `limit`. */
export function listMail(dir: string, options: { to?: string; limit?: number } = {}): MailSummary[] {
  return listStoredMail(dir, options)
    .slice(0, options.limit ?? 200)
    .map(summary);
}

/** The links in a message's text (http and https), each with its path in this app when it points here. */
export function linksIn(text: string, publicUrl: string): MailLink[] {
  const base = publicUrl.replace(/\/+$/, '');
  const seen = new Set<string>();
  const links: MailLink[] = [];
  for (const match of text.matchAll(/https?:\/\/[^\s<>"')]+/g)) {
    const href = match[0].replace(/[.,;]+$/, '');
    if (seen.has(href)) continue;
    seen.add(href);
    const appPath = href === base || href.startsWith(`${base}/`) ? href.slice(base.length) || '/' : null;
    links.push({ href, appPath });
  }
  return links;
}

/** One message for the mail reader (attachments without their content). */
export function readMail(dir: string, id: string, publicUrl: string): MailMessage | null {
  const mail = readStoredMail(dir, id);
  if (!mail) return null;
  return {
    ...summary(mail),
    from: mail.from,
    text: mail.text,
    html: mail.html,
    links: linksIn(mail.text ?? '', publicUrl),
    attachments: mail.attachments.map(({ filename, contentType, sizeBytes }) => ({ filename, contentType, sizeBytes })),
  };
}

/** One attachment's bytes, or null. */
export function readAttachment(dir: string, id: string, index: number): { filename: string; contentType: string; content: Buffer } | null {
  const attachment = readStoredMail(dir, id)?.attachments[index];
  if (!attachment) return null;
  return { filename: attachment.filename, contentType: attachment.contentType, content: Buffer.from(attachment.contentBase64, 'base64') };
}

/**
 * Waits until a message to `to` (received at or after `since`) matching `match` is stored.
 * For tests: mail sent in the background arrives a moment after the HTTP answer.
 */
export async function waitForMail(
  dir: string,
  to: string,
  { match = () => true, since, timeoutMs = 10_000 }: { match?: (mail: StoredMail) => boolean; since?: Date; timeoutMs?: number } = {},
): Promise<StoredMail> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const found = listStoredMail(dir, { to }).find((mail) => (!since || new Date(mail.receivedAt) >= since) && match(mail));
    if (found) return found;
    if (Date.now() > deadline) throw new Error(`No e-mail to ${to} arrived within ${timeoutMs} ms (mail folder ${dir})`);
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
}

/** Deletes every stored message (the mail reader's "clear" button). */
export function clearMail(dir: string): number {
  let removed = 0;
  for (const mail of listStoredMail(dir)) {
    fs.rmSync(path.join(dir, `${mail.id}.json`), { force: true });
    removed += 1;
  }
  return removed;
}
