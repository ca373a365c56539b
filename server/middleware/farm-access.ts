// Every farm route checks the caller's role on that farm: rights are per farm, by membership.
import type { Request, RequestHandler } from 'express';
import { Membership } from '../models';
import type { Role } from '../../shared/schemas/auth';
import { forbidden, notFound } from '../lib/http-error';
import { parseId } from './validate';

export async function membershipOf(userId: number, farmId: number): Promise<Membership | null> {
  return Membership.findOne({ where: { userId, farmId } });
}

/** The caller's membership on the farm, from those requireUser read with the user. */
export function callerMembership(req: Request, farmId: number): Membership | null {
  const row = req.memberships?.find((m) => m.farmId === farmId);
  return row ? Membership.fromJson(row) : null;
}

/** Sets req.membership for :farmId; non-members get 404, so farms' existence does not leak. */
export const loadFarmMembership: RequestHandler = async (req, _res, next) => {
  const farmId = parseId(req.params.farmId as string | undefined, 'farmId');
  const m = callerMembership(req, farmId);
  if (!m) throw notFound('That farm');
  req.membership = m;
  next();
};

/** 403 unless the caller's role on the farm is one of these. */
export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.membership || !roles.includes(req.membership.role)) {
      throw forbidden(`Only a ${roles.join(' or ')} on this farm may do that; your role is ${req.membership?.role ?? 'none'}.`);
    }
    next();
  };
}
