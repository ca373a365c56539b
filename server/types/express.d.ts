import type { User, Membership } from '../models';
import type { MembershipJson } from '../models/membership.model';

declare global {
  namespace Express {
    interface Request {
      user?: User;
      /** The caller's memberships, read with req.user (set by requireUser). */
      memberships?: MembershipJson[];
      /** The caller's membership on the farm the route touches (set by farm access middleware). */
      membership?: Membership;
    }
  }
}
export {};
