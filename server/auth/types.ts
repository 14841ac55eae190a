import type { Membership } from '../models/membership';
import type { User as UserModel } from '../models/user';

/** Who is asking, resolved once per request by `requireAuth`. */
export interface AuthContext {
  user: UserModel;
  /** The membership of the team this session works in. */
  membership: Membership;
  memberships: Membership[];
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends UserModel {}
    interface Request {
      auth?: AuthContext;
    }
  }
}

declare module 'express-session' {
  interface SessionData {
    activeTeamId?: string;
  }
}
