/** Who is asking: the signed-in user as routes see it on `req.user`. */
import type { TeamRole } from '../entities/user.ts';

export interface AuthUser {
  id: string;
  email: string;
  name: string;
  role: TeamRole;
  teamId: string;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends AuthUser {}
    interface Request {
      /** How req.user was established; token requests skip CSRF. */
      authVia?: 'session' | 'token';
    }
  }
}

declare module 'express-session' {
  interface SessionData {
    /** Set when a CSRF token is issued so an anonymous session is saved and its id stays stable. */
    csrfIssued?: boolean;
  }
}
