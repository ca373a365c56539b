// A field's overrides of R, K, C and P: every member who reaches the field reads them; the
// farmer and the advisor set and remove them.
import { Router, type Request, type Response } from 'express';
import type { Sequelize } from 'sequelize';
import { FactorOverrideUpdate, OverrideFactor } from '../../shared/schemas/overrides';
import { requireRole } from '../middleware/farm-access';
import { loadFieldMembership } from '../middleware/field-access';
import { validate } from '../middleware/validate';
import { badRequest } from '../lib/http-error';
import { deleteOverride, listOverrides, putOverride } from '../services/factor-overrides.service';

const actorOf = (req: Request) => ({ userId: req.user!.id });
const fieldOf = (req: Request, res: Response) => ({ id: res.locals.fieldId as number, farmId: req.membership!.farmId });

function factorParam(req: Request): OverrideFactor {
  const r = OverrideFactor.safeParse(req.params.factor);
  if (!r.success) throw badRequest('invalid_input', `factor: ${r.error.issues[0].message}`);
  return r.data;
}

export function factorOverridesRoutes(sequelize: Sequelize): Router {
  const router = Router();
  router.get('/:fieldId/overrides', loadFieldMembership, async (_req, res) => {
    res.json(await listOverrides(res.locals.fieldId as number));
  });
  router.put('/:fieldId/overrides', loadFieldMembership, requireRole('farmer', 'advisor'), validate(FactorOverrideUpdate), async (req, res) => {
    res.json(await putOverride(sequelize, actorOf(req), fieldOf(req, res), req.body));
  });
  router.delete('/:fieldId/overrides/:factor', loadFieldMembership, requireRole('farmer', 'advisor'), async (req, res) => {
    await deleteOverride(sequelize, actorOf(req), fieldOf(req, res), factorParam(req));
    res.status(204).end();
  });
  return router;
}
