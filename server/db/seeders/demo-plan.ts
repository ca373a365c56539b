// The demo farm's 2027 season plan (data/demo/plan-2027.json), submitted by the farmer, so the
// advisor has a plan to review as soon as the demo starts. Run once with the demo farm.
import { readFileSync } from 'node:fs';
import type { Sequelize } from 'sequelize';
import { Farm, Field, User } from '../../models';
import { PlanActionCreate } from '../../../shared/schemas/plans';
import { createPlan } from '../../services/plans/plans.service';
import { addAction } from '../../services/plans/plan-actions.service';
import { submitPlan } from '../../services/plans/plan-review.service';
import { demoFields, DEMO_ACCOUNTS, DEMO_FARM_NAME } from './demo-farm';

type PlanFile = {
  season: string;
  actions: ({ field: string; perHa?: boolean; quantity?: number; unit: string; unitCost: number } & Record<string, unknown>)[];
};

const M2_PER_HA = 10_000;

export async function seedDemoPlan(sequelize: Sequelize): Promise<void> {
  const data = JSON.parse(readFileSync('data/demo/plan-2027.json', 'utf8')) as PlanFile;
  const farm = (await Farm.findOne({ where: { name: DEMO_FARM_NAME } }))!;
  const farmer = (await User.findOne({ where: { email: DEMO_ACCOUNTS[0].email } }))!;
  const actor = { userId: farmer.id };
  const nameByKey = new Map(demoFields().map((f) => [(f.properties as { key?: string }).key ?? '', f.properties.name]));
  const fields = new Map((await Field.findAll({ where: { farmId: farm.id }, attributes: ['id', 'name', 'areaM2'] })).map((f) => [f.name, f]));
  const { plan } = await createPlan(sequelize, actor, farm.id, data.season);
  let version = plan.version;
  for (const { field: key, perHa, quantity: given, unitCost, ...rest } of data.actions) {
    const field = fields.get(nameByKey.get(key) ?? '');
    if (!field) throw new Error(`The demo plan names a field the demo farm does not have: ${key}`);
    const quantity = perHa ? Math.round((field.areaM2 / M2_PER_HA) * 10) / 10 : given!;
    const input = PlanActionCreate.parse({ ...rest, fieldId: field.id, quantity, cost: Math.round(quantity * unitCost) });
    version = (await addAction(sequelize, actor, plan.id, input)).plan.version;
  }
  await submitPlan(sequelize, actor, plan.id, version);
}
