import { ApiError, csrfHeader } from '@/components/api/client';

/**
 * Fetches a drawn file (SVG text) from the API: GET for a sight-in's sheet, POST
 * with a JSON body for the try-it routes. A failure throws ApiError with the
 * server's own message, as apiFetch does for JSON.
 * Example: `await fetchDrawing('/api/sight-ins/4/sheet.svg?paper=a4')` → '<svg …'
 */
export async function fetchDrawing(path: string, body?: unknown): Promise<string> {
  let res: Response;
  try {
    res = await fetch(path, {
      method: body === undefined ? 'GET' : 'POST',
      credentials: 'same-origin',
      headers: body === undefined ? { Accept: 'image/svg+xml' } : { 'Content-Type': 'application/json', [csrfHeader]: '1' },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    throw new ApiError(0, 'network', 'Cannot reach Pinwright. Check your connection and try again.');
  }
  if (!res.ok) {
    let message = `The drawing could not be made (HTTP ${res.status}).`;
    let code = 'error';
    try {
      const payload = (await res.json()) as { error?: { message?: string; code?: string } };
      if (payload.error?.message) message = payload.error.message;
      if (payload.error?.code) code = payload.error.code;
    } catch {
      // Not JSON: keep the plain message.
    }
    throw new ApiError(res.status, code, message);
  }
  return res.text();
}

/** Where the try-it page leaves the sheet request for the print page (this tab only). */
export const TRY_SHEET_STORAGE_KEY = 'pinwright.try.sheet';
