import { ApiError, apiFetch, isApiError } from '@/components/api/client';
import { userSchema } from '@/shared/auth';
import { z } from 'zod';

import { jsonResponse, mockFetch } from './helpers';

/** The ApiError a call rejects with (fails the test if it resolves or rejects with something else). */
async function failure(call: Promise<unknown>): Promise<ApiError> {
  const caught = await call.then(
    () => new Error('expected the call to fail'),
    (error: unknown) => error,
  );
  if (!(caught instanceof ApiError)) throw caught;
  return caught;
}

describe('apiFetch', () => {
  it('sends a GET without the CSRF header or a body, with same-origin credentials', async () => {
    const fetchMock = mockFetch();
    fetchMock.mockResolvedValue(jsonResponse(200, { status: 'ok', db: 'up' }));
    await expect(apiFetch('/api/health')).resolves.toEqual({ status: 'ok', db: 'up' });
    const [path, init] = fetchMock.mock.calls[0];
    expect(path).toBe('/api/health');
    expect(init.method).toBe('GET');
    expect(init.credentials).toBe('same-origin');
    expect(init.body).toBeUndefined();
    expect(init.headers['X-Pinwright-Csrf']).toBeUndefined();
  });

  it.each(['POST', 'PUT', 'PATCH', 'DELETE'] as const)('adds X-Pinwright-Csrf: 1 to a %s', async (method) => {
    const fetchMock = mockFetch();
    fetchMock.mockResolvedValue(jsonResponse(204));
    await expect(apiFetch('/api/things/1', { method })).resolves.toBeUndefined();
    expect(fetchMock.mock.calls[0][1].headers['X-Pinwright-Csrf']).toBe('1');
  });

  it("turns the server's error shape into an ApiError with status, code, message and fields", async () => {
    const fetchMock = mockFetch();
    fetchMock.mockResolvedValue(
      jsonResponse(400, {
        error: { code: 'validation_failed', message: 'Check the form', fields: { email: 'Enter a valid e-mail address' } },
      }),
    );
    const error = await failure(apiFetch('/api/auth/sign-up', { method: 'POST', body: {} }));
    expect(isApiError(error)).toBe(true);
    expect(error).toBeInstanceOf(ApiError);
    expect(error.status).toBe(400);
    expect(error.code).toBe('validation_failed');
    expect(error.message).toBe('Check the form');
    expect(error.fields).toEqual({ email: 'Enter a valid e-mail address' });
  });

  it('sends a FormData body as it is (multipart, the browser sets its Content-Type), with the CSRF header', async () => {
    const fetchMock = mockFetch();
    fetchMock.mockResolvedValue(jsonResponse(201, { photo: { id: 1 } }));
    const body = new FormData();
    body.append('photo', new Blob(['x'], { type: 'image/jpeg' }), 'step.jpg');
    await apiFetch('/api/checks/3/steps/second-axis/photo', { method: 'POST', body });
    const [, init] = fetchMock.mock.calls[0];
    expect(init.body).toBe(body);
    expect(init.headers['Content-Type']).toBeUndefined();
    expect(init.headers['X-Pinwright-Csrf']).toBe('1');
  });

  it('names a too-large upload refused without a JSON body', async () => {
    const fetchMock = mockFetch();
    fetchMock.mockResolvedValue(jsonResponse(413));
    const error = await failure(apiFetch('/api/checks/3/steps/second-axis/photo', { method: 'POST', body: new FormData() }));
    expect(error.code).toBe('too_large');
    expect(error.message).toBe('That file is too large to send.');
  });

  it('names a failure without a JSON body by its status', async () => {
    const fetchMock = mockFetch();
    fetchMock.mockResolvedValue(jsonResponse(429));
    const error = await failure(apiFetch('/api/auth/sign-in', { method: 'POST', body: {} }));
    expect(isApiError(error, 429)).toBe(true);
    expect(error.code).toBe('rate_limited');
    expect(error.message.length).toBeGreaterThan(0);
  });

  it('reports an unreachable server as status 0, code "network"', async () => {
    const fetchMock = mockFetch();
    fetchMock.mockRejectedValue(new TypeError('Failed to fetch'));
    const error = await failure(apiFetch('/api/me'));
    expect(isApiError(error, 0)).toBe(true);
    expect(error.code).toBe('network');
  });

  it('parses the answer with a schema and refuses one that does not match', async () => {
    const fetchMock = mockFetch();
    const schema = z.object({ user: userSchema });
    fetchMock.mockResolvedValueOnce(
      jsonResponse(200, {
        user: { id: 1, name: 'Ned Arlow', email: 'ned@example.org', role: 'tech', distanceUnit: 'm', lengthUnit: 'in' },
      }),
    );
    await expect(apiFetch('/api/me', { schema })).resolves.toMatchObject({ user: { role: 'tech' } });

    fetchMock.mockResolvedValueOnce(jsonResponse(200, { user: { id: 'one' } }));
    const error = await failure(apiFetch('/api/me', { schema }));
    expect(isApiError(error)).toBe(true);
    expect(error.code).toBe('bad_response');
  });

  it("returns a drawn file as text or a Blob, with the CSRF header on a POST, and the server's error as an ApiError", async () => {
    const fetchMock = mockFetch();
    const svg = '<svg xmlns="http://www.w3.org/2000/svg"/>';
    fetchMock.mockResolvedValueOnce({ ok: true, status: 200, headers: { get: () => 'image/svg+xml' }, text: async () => svg });
    await expect(apiFetch('/api/sight-ins/4/sheet.svg?paper=a4', { responseType: 'text' })).resolves.toBe(svg);
    expect(fetchMock.mock.calls[0][1].method).toBe('GET');
    expect(fetchMock.mock.calls[0][1].headers['X-Pinwright-Csrf']).toBeUndefined();

    const pdf = new Blob(['%PDF-1.7'], { type: 'application/pdf' });
    fetchMock.mockResolvedValueOnce({ ok: true, status: 200, headers: { get: () => 'application/pdf' }, blob: async () => pdf });
    await expect(apiFetch('/api/try/sheet.pdf', { method: 'POST', body: { paper: 'a4' }, responseType: 'blob' })).resolves.toBe(pdf);
    const [, init] = fetchMock.mock.calls[1];
    expect(init.headers['X-Pinwright-Csrf']).toBe('1');
    expect(init.headers['Content-Type']).toBe('application/json');
    expect(init.body).toBe(JSON.stringify({ paper: 'a4' }));

    fetchMock.mockResolvedValueOnce(jsonResponse(400, { error: { code: 'validation_failed', message: 'These marks cannot be fitted.' } }));
    const error = await failure(apiFetch('/api/try/sheet.svg', { method: 'POST', body: {}, responseType: 'text' }));
    expect(error.status).toBe(400);
    expect(error.message).toBe('These marks cannot be fitted.');
  });

  it('refuses an HTML page where JSON was expected (a static server answering /api)', async () => {
    const fetchMock = mockFetch();
    fetchMock.mockResolvedValue({ ok: true, status: 200, headers: { get: () => 'text/html' }, json: async () => ({}) });
    const error = await failure(apiFetch('/api/me'));
    expect(error.code).toBe('bad_response');
  });
});
