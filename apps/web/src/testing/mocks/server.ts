import { setupServer } from 'msw/node';
import { handlers } from './handlers';

/** The mock API for component tests; tests add handlers with `server.use(...)`. */
export const server = setupServer(...handlers);
