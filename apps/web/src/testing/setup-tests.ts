import '@testing-library/jest-dom/vitest';
import { cleanup, configure } from '@testing-library/react';
import { afterAll, afterEach, beforeAll } from 'vitest';
import { resetCsrfToken } from '../lib/api-client';
import { server } from './mocks/server';

// Two shared CPU cores run several test files at once: give async queries room before failing.
configure({ asyncUtilTimeout: 4000 });

beforeAll(() => server.listen({ onUnhandledRequest: 'error' }));
afterEach(() => {
  cleanup();
  server.resetHandlers();
  resetCsrfToken();
  localStorage.clear();
});
afterAll(() => server.close());
