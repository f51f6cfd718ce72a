import type { Response } from 'express';

/** A drawn or exported file: tape, sheet, field card, CSV or JSON export. */
export type FileAnswer = { body: string | Buffer; contentType: string; fileName: string };

/** Sends the file as an attachment with its name; never cached (the records may change on the next save). */
export function send(res: Response, file: FileAnswer): void {
  res.attachment(file.fileName);
  res.setHeader('Content-Type', file.contentType);
  res.setHeader('Cache-Control', 'no-store');
  res.send(file.body);
}
