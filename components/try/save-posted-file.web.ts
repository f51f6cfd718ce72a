import { ApiError, csrfHeader } from '@/components/api/client';

// A POSTed file cannot be a plain <a download> link, so the web build fetches it
// and saves it through a temporary object URL (the browser's own download).
/**
 * Fetches a file the API draws from a POSTed JSON request and saves it under `fileName`.
 * Example: `await savePostedFile('/api/try/sheet.pdf', input, 'pinwright-sheet.pdf')`
 */
export async function savePostedFile(path: string, body: unknown, fileName: string): Promise<void> {
  let res: Response;
  try {
    res = await fetch(path, {
      method: 'POST',
      credentials: 'same-origin',
      headers: { 'Content-Type': 'application/json', [csrfHeader]: '1' },
      body: JSON.stringify(body),
    });
  } catch {
    throw new ApiError(0, 'network', 'Cannot reach Pinwright. Check your connection and try again.');
  }
  if (!res.ok) {
    let message = `The file could not be made (HTTP ${res.status}).`;
    try {
      const payload = (await res.json()) as { error?: { message?: string } };
      if (payload.error?.message) message = payload.error.message;
    } catch {
      // Not JSON: keep the plain message.
    }
    throw new ApiError(res.status, 'error', message);
  }
  const url = URL.createObjectURL(await res.blob());
  const link = document.createElement('a');
  link.href = url;
  link.download = fileName;
  document.body.appendChild(link);
  link.click();
  link.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
