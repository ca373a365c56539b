// What the soils routers share: who may change soils, and the values the access middleware left.
import type { Request, Response } from 'express';
import { requireRole } from '../middleware/farm-access';

/** Who may change soils on a farm: the farmer, and the advisor who works with them. */
export const editsSoils = requireRole('farmer', 'advisor');

export const actorOf = (req: Request) => ({ userId: req.user!.id });
/** Set by loadFieldMembership or the soil sample/photo access middleware. */
export const fieldIdOf = (res: Response) => res.locals.fieldId as number;
