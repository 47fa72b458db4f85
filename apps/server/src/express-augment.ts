import type { User as AppUser } from './modules/user/user.entity.js';
import type { Membership } from './modules/organization/membership.entity.js';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // The session user is the full User entity (loaded per request by passport).
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends AppUser {}
    interface Request {
      /** Set by `requireMembership`: the signed-in user's membership in `:orgId`. */
      membership?: Membership;
    }
  }
}

export {};
