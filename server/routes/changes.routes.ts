// A farm's records over time, for the farmer and the advisor: the recent changes (who changed
// what, when) and each field's soil loss across seasons. A landowner gets 403.
import { Router } from 'express';
import { ChangesQuery } from '../../shared/schemas/changes';
import { badRequest } from '../lib/http-error';
import { loadFarmMembership, requireRole } from '../middleware/farm-access';
import { recentChanges, soilLossHistory } from '../services/changes.service';

export function changesRoutes(): Router {
  const farms = Router();
  farms.get('/:farmId/changes', loadFarmMembership, requireRole('farmer', 'advisor'), async (req, res) => {
    const q = ChangesQuery.safeParse(req.query);
    if (!q.success) throw badRequest('invalid_input', `limit: ${q.error.issues[0].message.replace(/^limit /, '')}`);
    res.json(await recentChanges(req.membership!.farmId, q.data.limit));
  });
  farms.get('/:farmId/soil-loss-history', loadFarmMembership, requireRole('farmer', 'advisor'), async (req, res) => {
    res.json(await soilLossHistory(req.membership!.farmId));
  });
  return farms;
}
