import { http, HttpResponse } from 'msw';

export const TEST_CSRF_TOKEN = 'csrf-test-token';

/**
 * A JSON error in the API's shape.
 * @param status HTTP status
 * @param code error code
 * @param message human message
 * @param extra `field` / `fields`
 * @returns the MSW response
 * @example return apiErrorResponse(401, 'INVALID_CREDENTIALS', 'E-mail or password is incorrect.');
 */
export function apiErrorResponse(
  status: number,
  code: string,
  message: string,
  extra: { field?: string; fields?: Record<string, string> } = {},
) {
  return HttpResponse.json({ error: { code, message, ...extra } }, { status });
}

/**
 * Whether a mocked mutation carried the CSRF token the mock handed out.
 * @param request the intercepted request
 * @returns true when the header matches
 * @example if (!hasCsrf(request)) return apiErrorResponse(403, 'CSRF_INVALID', '…');
 */
export function hasCsrf(request: Request): boolean {
  return request.headers.get('x-csrf-token') === TEST_CSRF_TOKEN;
}

/** Handlers every test gets: the CSRF token, providers, and a signed-out session. */
export const handlers = [
  http.get('*/api/auth/csrf', () => HttpResponse.json({ csrfToken: TEST_CSRF_TOKEN })),
  http.get('*/api/auth/providers', () => HttpResponse.json({ google: { enabled: true, label: 'Continue with Google' } })),
  http.get('*/api/me', () => apiErrorResponse(401, 'UNAUTHENTICATED', 'Sign in to continue.')),
];
