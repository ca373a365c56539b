import type { User, Membership } from '../models';

declare global {
  namespace Express {
    interface Request {
      user?: User;
      /** The caller's memberships, read with req.user (set by requireUser). */
      memberships?: Membership[];
      /** The caller's membership on the farm the route touches (set by farm access middleware). */
      membership?: Membership;
    }
  }
}
export {};
