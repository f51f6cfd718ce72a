/**
 * A small reader for the Internet messages our own mailer writes (RFC 5322
 * header fields, RFC 2045/2046 MIME parts, RFC 2047 encoded words). It is
 * enough for the development mail reader and the tests; it is not a general
 * mail parser (no S/MIME, no uuencode, no RFC 2231 continuations beyond one
 * `name*=charset''value` parameter).
 *
 * Example: parseMessage(Buffer.from('Subject: Hi\r\n\r\nHello'))
 *   → { subject: 'Hi', text: 'Hello', html: null, attachments: [], headers: { subject: 'Hi' }, … }
 */

export type MimeHeaders = Record<string, string>;

export type ParsedAttachment = { filename: string; contentType: string; content: Buffer };

export type ParsedMessage = {
  headers: MimeHeaders;
  subject: string;
  from: string;
  to: string;
  date: string;
  messageId: string;
  text: string | null;
  html: string | null;
  attachments: ParsedAttachment[];
};

type Part = { headers: MimeHeaders; body: string };

/** Decodes RFC 2047 encoded words (`=?utf-8?B?…?=`, `=?utf-8?Q?…?=`) in a header value. */
export function decodeEncodedWords(value: string): string {
  // Whitespace between two adjacent encoded words is not part of the text (RFC 2047 §6.2).
  const joined = value.replace(/(\?=)\s+(=\?)/g, '$1$2');
  return joined.replace(/=\?([^?]+)\?([bBqQ])\?([^?]*)\?=/g, (_all, charset: string, encoding: string, data: string) => {
    const bytes =
      encoding.toUpperCase() === 'B' ? Buffer.from(data, 'base64') : Buffer.from(decodeQuotedPrintable(data.replace(/_/g, ' ')), 'latin1');
    return bytesToText(bytes, charset);
  });
}

function bytesToText(bytes: Buffer, charset = 'utf-8'): string {
  const name = charset.toLowerCase();
  if (name === 'iso-8859-1' || name === 'latin1' || name === 'us-ascii') return bytes.toString('latin1');
  return bytes.toString('utf8');
}

/** Quoted-printable (RFC 2045 §6.7) to a binary ("latin1") string of the original bytes. */
export function decodeQuotedPrintable(input: string): string {
  return input.replace(/=\r?\n/g, '').replace(/=([0-9A-Fa-f]{2})/g, (_all, hex: string) => String.fromCharCode(parseInt(hex, 16)));
}

/** Splits `a/b; x=1; y="two"` into the value and its parameters (names lower-cased). */
export function parseHeaderValue(value: string): { value: string; params: Record<string, string> } {
  const pieces: string[] = [];
  let current = '';
  let quoted = false;
  for (const ch of value) {
    if (ch === '"') quoted = !quoted;
    if (ch === ';' && !quoted) {
      pieces.push(current);
      current = '';
    } else current += ch;
  }
  pieces.push(current);
  const params: Record<string, string> = {};
  for (const piece of pieces.slice(1)) {
    const eq = piece.indexOf('=');
    if (eq < 0) continue;
    let name = piece.slice(0, eq).trim().toLowerCase();
    let raw = piece.slice(eq + 1).trim();
    if (raw.startsWith('"') && raw.endsWith('"')) raw = raw.slice(1, -1).replace(/\\(.)/g, '$1');
    if (name.endsWith('*')) {
      // RFC 2231: charset'language'percent-encoded
      name = name.slice(0, -1);
      const match = /^([^']*)'[^']*'(.*)$/.exec(raw);
      if (match) raw = bytesToText(Buffer.from(decodeURIComponentBytes(match[2]), 'latin1'), match[1] || 'utf-8');
    }
    params[name] = decodeEncodedWords(raw);
  }
  return { value: pieces[0].trim().toLowerCase(), params };
}

function decodeURIComponentBytes(input: string): string {
  return input.replace(/%([0-9A-Fa-f]{2})/g, (_all, hex: string) => String.fromCharCode(parseInt(hex, 16)));
}

/** Splits a binary string into header fields (unfolded, names lower-cased) and the body. */
function splitPart(binary: string): Part {
  const match = /\r?\n\r?\n/.exec(binary);
  const headerText = match ? binary.slice(0, match.index) : binary;
  const body = match ? binary.slice(match.index + match[0].length) : '';
  const headers: MimeHeaders = {};
  // Unfold: a line starting with white space continues the previous field (RFC 5322 §2.2.3).
  const unfolded = headerText.replace(/\r?\n[ \t]+/g, ' ');
  for (const line of unfolded.split(/\r?\n/)) {
    const colon = line.indexOf(':');
    if (colon <= 0) continue;
    const name = line.slice(0, colon).trim().toLowerCase();
    const value = line.slice(colon + 1).trim();
    headers[name] = name in headers ? `${headers[name]}, ${value}` : value;
  }
  return { headers, body };
}

function decodeBody(part: Part): Buffer {
  const encoding = (part.headers['content-transfer-encoding'] ?? '7bit').toLowerCase();
  if (encoding === 'base64') return Buffer.from(part.body.replace(/[^A-Za-z0-9+/=]/g, ''), 'base64');
  if (encoding === 'quoted-printable') return Buffer.from(decodeQuotedPrintable(part.body), 'latin1');
  return Buffer.from(part.body, 'latin1');
}

function splitMultipart(body: string, boundary: string): string[] {
  const delimiter = `--${boundary}`;
  const lines = body.split(/\r?\n/);
  const parts: string[] = [];
  let current: string[] | null = null;
  for (const line of lines) {
    if (line === `${delimiter}--` || line.trimEnd() === `${delimiter}--`) {
      if (current) parts.push(current.join('\r\n'));
      current = null;
      break;
    }
    if (line === delimiter || line.trimEnd() === delimiter) {
      if (current) parts.push(current.join('\r\n'));
      current = [];
      continue;
    }
    if (current) current.push(line);
  }
  if (current) parts.push(current.join('\r\n'));
  return parts;
}

function walk(part: Part, out: ParsedMessage, depth: number) {
  const type = parseHeaderValue(part.headers['content-type'] ?? 'text/plain; charset=us-ascii');
  const disposition = parseHeaderValue(part.headers['content-disposition'] ?? '');
  if (type.value.startsWith('multipart/') && type.params.boundary && depth < 8) {
    for (const child of splitMultipart(part.body, type.params.boundary)) walk(splitPart(child), out, depth + 1);
    return;
  }
  const content = decodeBody(part);
  const filename = disposition.params.filename ?? type.params.name;
  const isAttachment = disposition.value === 'attachment' || (filename !== undefined && !type.value.startsWith('text/'));
  if (!isAttachment && type.value === 'text/plain' && out.text === null) {
    out.text = bytesToText(content, type.params.charset);
  } else if (!isAttachment && type.value === 'text/html' && out.html === null) {
    out.html = bytesToText(content, type.params.charset);
  } else {
    out.attachments.push({ filename: filename ?? 'attachment', contentType: type.value, content });
  }
}

/** Parses a whole message (as received over SMTP) into its headers, text, HTML and attachments. */
export function parseMessage(raw: Buffer): ParsedMessage {
  const root = splitPart(raw.toString('latin1'));
  const header = (name: string) => decodeEncodedWords(bytesToText(Buffer.from(root.headers[name] ?? '', 'latin1')));
  const out: ParsedMessage = {
    headers: Object.fromEntries(Object.keys(root.headers).map((name) => [name, header(name)])),
    subject: header('subject'),
    from: header('from'),
    to: header('to'),
    date: header('date'),
    messageId: header('message-id'),
    text: null,
    html: null,
    attachments: [],
  };
  walk(root, out, 0);
  return out;
}
