import { apiFetch } from '@/components/api/client';

// A POSTed file cannot be a plain <a download> link, so the web build fetches it
// (through apiFetch, the one door to the API) and saves it through a temporary
// object URL (the browser's own download).
/**
 * Fetches a file the API draws from a POSTed JSON request and saves it under `fileName`.
 * Example: `await savePostedFile('/api/try/sheet.pdf', input, 'pinwright-sheet.pdf')`
 */
export async function savePostedFile(path: string, body: unknown, fileName: string): Promise<void> {
  const file = await apiFetch(path, { method: 'POST', body, responseType: 'blob' });
  const url = URL.createObjectURL(file);
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  document.body.appendChild(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
