/**
 * Saves a file the API draws from a POSTed request (the try-it tape and sheet).
 * Outside the web there is no download folder to save to; the web build uses
 * save-posted-file.web.ts, which fetches the file and hands it to the browser.
 * Example: `await savePostedFile('/api/try/sheet.pdf', input, 'pinwright-sheet.pdf')`
 */
export async function savePostedFile(path: string, body: unknown, fileName: string): Promise<void> {
  void path;
  void body;
  void fileName;
  throw new Error('Downloads work from the web app.');
}
