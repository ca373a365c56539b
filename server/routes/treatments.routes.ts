// Treatments, the farm's price list and the budget planner. Farmers and advisors plan; a
// landowner reads the approved plan elsewhere, not the options or the money.
import { Router, type Request } from 'express';
import type { Sequelize } from 'sequelize';
import { BudgetPlanRequest, PricesUpdate, TreatmentsQuery } from '../../shared/schemas/treatments';
import { loadFarmMembership, requireRole } from '../middleware/farm-access';
import { loadFieldMembership } from '../middleware/field-access';
import { validate } from '../middleware/validate';
import { badRequest } from '../lib/http-error';
import { budgetPlan } from '../services/treatments/budget-plan.service';
import { farmTreatments, fieldTreatmentsAnswer } from '../services/treatments/farm-treatments.service';
import { putPrices, readPrices } from '../services/treatments/prices.service';

const planners = requireRole('farmer', 'advisor');
const farmOf = (req: Request) => req.membership!.farmId;

function seasonOf(req: Request): string | undefined {
  const r = TreatmentsQuery.safeParse({ season: req.query.season });
  if (!r.success) throw badRequest('invalid_input', `season: ${r.error.issues[0].message}`);
  return r.data.season;
}

export function treatmentsRoutes(sequelize: Sequelize): { farms: Router; fields: Router } {
  const farms = Router();
  farms.get('/:farmId/prices', loadFarmMembership, planners, async (req, res) => {
    res.json(await readPrices(farmOf(req)));
  });
  farms.put('/:farmId/prices', loadFarmMembership, planners, validate(PricesUpdate), async (req, res) => {
    res.json(await putPrices(sequelize, { userId: req.user!.id }, farmOf(req), req.body));
  });
  farms.get('/:farmId/treatments', loadFarmMembership, planners, async (req, res) => {
    const season = seasonOf(req);
    res.json(await farmTreatments(sequelize, { farmId: farmOf(req), units: req.user!.units, ...(season ? { seasonLabel: season } : {}) }));
  });
  farms.post('/:farmId/budget-plan', loadFarmMembership, planners, validate(BudgetPlanRequest), async (req, res) => {
    res.json(await budgetPlan(sequelize, farmOf(req), req.body, req.user!.units));
  });

  const fields = Router();
  fields.get('/:fieldId/treatments', loadFieldMembership, planners, async (req, res) => {
    res.json(await fieldTreatmentsAnswer(sequelize, farmOf(req), res.locals.fieldId as number, seasonOf(req), req.user!.units));
  });
  return { farms, fields };
}
