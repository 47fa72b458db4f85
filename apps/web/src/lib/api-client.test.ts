import { http, HttpResponse } from 'msw';
import { describe, expect, it } from 'vitest';
import { TEST_CSRF_TOKEN } from '../testing/mocks/handlers';
import { server } from '../testing/mocks/server';
import { api, resetCsrfToken } from './api-client';
import { ApiError } from './api-error';

describe('apiRequest', () => {
  it('fetches the CSRF token once and sends it on every mutation, never on reads', async () => {
    let tokenRequests = 0;
    const seen: (string | null)[] = [];
    server.use(
      http.get('*/api/auth/csrf', () => {
        tokenRequests += 1;
        return HttpResponse.json({ csrfToken: TEST_CSRF_TOKEN });
      }),
      http.all('*/api/things', ({ request }) => {
        seen.push(request.headers.get('x-csrf-token'));
        return HttpResponse.json({ ok: true });
      }),
    );
    await api.get('/things');
    await api.post('/things', { a: 1 });
    await api.patch('/things', { a: 2 });
    await api.delete('/things');
    expect(seen).toEqual([null, TEST_CSRF_TOKEN, TEST_CSRF_TOKEN, TEST_CSRF_TOKEN]);
    expect(tokenRequests).toBe(1);
  });

  it('fetches a fresh token and retries once when the server rejects the token', async () => {
    const tokens = ['stale-token', 'fresh-token'];
    const attempts: (string | null)[] = [];
    resetCsrfToken();
    server.use(
      http.get('*/api/auth/csrf', () => HttpResponse.json({ csrfToken: tokens.shift() })),
      http.post('*/api/things', ({ request }) => {
        const token = request.headers.get('x-csrf-token');
        attempts.push(token);
        if (token !== 'fresh-token') {
          return HttpResponse.json({ error: { code: 'CSRF_INVALID', message: 'Bad token.' } }, { status: 403 });
        }
        return HttpResponse.json({ ok: true });
      }),
    );
    await expect(api.post('/things', {})).resolves.toEqual({ ok: true });
    expect(attempts).toEqual(['stale-token', 'fresh-token']);
  });

  it('turns an error body into a typed ApiError with code and field', async () => {
    server.use(
      http.post('*/api/things', () =>
        HttpResponse.json(
          { error: { code: 'VALIDATION_FAILED', message: 'Name is required.', field: 'name', fields: { name: 'Name is required.' } } },
          { status: 400 },
        ),
      ),
    );
    const error = await api.post('/things', {}).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 400, code: 'VALIDATION_FAILED', field: 'name', message: 'Name is required.' });
  });

  it('keeps machine-readable details such as a suggested cell size', async () => {
    server.use(
      http.post('*/api/things', () =>
        HttpResponse.json(
          { error: { code: 'GRID_TOO_LARGE', message: 'Use at least 75 m.', field: 'cellSize', details: { suggestedCellSize: 75 } } },
          { status: 400 },
        ),
      ),
    );
    const error = await api.post('/things', {}).catch((e: unknown) => e);
    expect(error).toMatchObject({ code: 'GRID_TOO_LARGE', details: { suggestedCellSize: 75 } });
  });

  it('explains an error response that is not in the API shape', async () => {
    server.use(http.get('*/api/things', () => new HttpResponse('<html>Bad gateway</html>', { status: 502 })));
    const error = await api.get('/things').catch((e: unknown) => e);
    expect(error).toMatchObject({ status: 502, code: 'HTTP_ERROR' });
    expect((error as Error).message).toContain('502');
  });

  it('reports an unreachable server as a network error', async () => {
    server.use(http.get('*/api/things', () => HttpResponse.error()));
    const error = await api.get('/things').catch((e: unknown) => e);
    expect(error).toMatchObject({ status: 0, code: 'NETWORK_ERROR' });
  });

  it('returns the JSON body of a 202 Accepted, with the CSRF retry like any mutation', async () => {
    const tokens = ['stale-token', 'fresh-token'];
    resetCsrfToken();
    server.use(
      http.get('*/api/auth/csrf', () => HttpResponse.json({ csrfToken: tokens.shift() })),
      http.post('*/api/runs', ({ request }) =>
        request.headers.get('x-csrf-token') === 'fresh-token'
          ? HttpResponse.json({ run: { id: 'scr_1', status: 'queued' } }, { status: 202 })
          : HttpResponse.json({ error: { code: 'CSRF_INVALID', message: 'Bad token.' } }, { status: 403 }),
      ),
    );
    await expect(api.post('/runs', { surfaceId: 'srf_1' })).resolves.toEqual({ run: { id: 'scr_1', status: 'queued' } });
  });

  it('returns undefined for a 202 Accepted without a body', async () => {
    server.use(http.post('*/api/things', () => new HttpResponse(null, { status: 202 })));
    await expect(api.post('/things', {})).resolves.toBeUndefined();
  });

  it('returns undefined for 204 No Content', async () => {
    server.use(http.delete('*/api/things', () => new HttpResponse(null, { status: 204 })));
    await expect(api.delete('/things')).resolves.toBeUndefined();
  });

  it('sends a FormData body as multipart (no JSON content type) and keeps a refused import’s row errors', async () => {
    let seen: { type: string | null; kind: string | null; file: string | null } | null = null;
    server.use(
      http.post('*/api/uploads', async ({ request }) => {
        const type = request.headers.get('content-type');
        const form = await request.formData();
        const file = form.get('file');
        seen = { type, kind: form.get('defaultKind') as string | null, file: file instanceof File ? await file.text() : null };
        return HttpResponse.json(
          { error: { code: 'SITE_ROWS_INVALID', message: '1 row of the file has errors.', rowErrors: [{ row: 2, field: 'lat', message: 'must be between -90 and 90' }] } },
          { status: 400 },
        );
      }),
    );
    const form = new FormData();
    form.append('defaultKind', 'candidate');
    form.append('file', new File(['name,lon,lat\nA,1,95\n'], 'sites.csv', { type: 'text/csv' }));
    const error = await api.post('/uploads', form).catch((e: unknown) => e);
    expect(seen!.type).toMatch(/^multipart\/form-data; boundary=/);
    expect(seen!.kind).toBe('candidate');
    expect(seen!.file).toContain('A,1,95');
    expect(error).toMatchObject({ code: 'SITE_ROWS_INVALID', details: { rowErrors: [{ row: 2, field: 'lat' }] } });
  });
});
