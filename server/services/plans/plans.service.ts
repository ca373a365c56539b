// Creating a farm's plan for a season, and what every change to a plan shares: the lock, the
// version check (409 when stale), the rule that a plan in review is not changed, and the new
// revision an approved plan starts when it is changed.
import { UniqueConstraintError, type Sequelize, type Transaction } from 'sequelize';
import type { Plan as PlanShape } from '../../../shared/schemas/plans';
import { conflict, invalid, notFound } from '../../lib/http-error';
import { EXAMPLE_PRICES } from '../../../shared/erosion/treatments/example-prices';
import { FarmPrices, Plan } from '../../models';
import { recordEvent } from '../audit';
import { createSeason } from '../seasons.service';
import { livePlan } from './plan-read.service';

export type Actor = { userId: number };


/**
 * POST /api/farms/:farmId/plans: the season's plan, made (with the season) when missing. Its money
 * is in the farm's price-list currency (the example list's while the farm has none).
 */
export async function createPlan(sequelize: Sequelize, actor: Actor, farmId: number, seasonLabel: string): Promise<{ plan: PlanShape; created: boolean }> {
  const { season } = await createSeason(sequelize, actor, farmId, seasonLabel);
  const existing = await Plan.findOne({ where: { seasonId: season.id }, attributes: ['id'] });
  if (existing) return { plan: await livePlan(existing.id), created: false };
  try {
    const id = await sequelize.transaction(async (t) => {
      const prices = await FarmPrices.findByPk(farmId, { attributes: ['currency'], transaction: t });
      const plan = await Plan.create({ farmId, seasonId: season.id, currency: prices?.currency ?? EXAMPLE_PRICES.currency, createdBy: actor.userId }, { transaction: t });
      await recordEvent({ userId: actor.userId, farmId, entity: 'plan', entityId: plan.id, action: 'created', detail: { season: season.label } }, t);
      return plan.id;
    });
    return { plan: await livePlan(id), created: true };
  } catch (e) {
    // Someone made the season's plan at the same moment: answer with theirs.
    if (!(e instanceof UniqueConstraintError)) throw e;
    const theirs = await Plan.findOne({ where: { seasonId: season.id }, attributes: ['id'] });
    if (!theirs) throw e;
    return { plan: await livePlan(theirs.id), created: false };
  }
}

/** The plan, locked for the transaction; 409 when the caller read an older version. */
export async function lockPlan(planId: number, sentVersion: number | undefined, t: Transaction): Promise<Plan> {
  const plan = await Plan.lockForChange(planId, t);
  if (!plan) throw notFound('That plan');
  if (sentVersion !== undefined && sentVersion !== plan.version) {
    throw conflict(
      'stale_version',
      `Someone changed this plan since you opened it (you had version ${sentVersion}, it is now ${plan.version}). Look at what changed, then try again.`,
      { current: await livePlan(planId, t) },
    );
  }
  return plan;
}

/**
 * Readies a locked plan for a change to its actions: refused while it is with the advisor; an
 * approved plan starts a new revision in draft (its approved revision stays frozen for the
 * landowner). Bumps the plan's version, so a reviewer holding the old one gets a 409.
 */
export async function openForEdit(plan: Plan, actor: Actor, t: Transaction): Promise<void> {
  if (plan.state === 'submitted') {
    throw invalid('plan_submitted', 'This plan is with the advisor for review and cannot be changed until they return it (or approve it, after which a change starts a new revision).');
  }
  if (plan.state === 'approved') {
    const revision = plan.revision + 1;
    await plan.update(
      { state: 'draft', revision, version: plan.version + 1, submittedBy: null, submittedAt: null, returnedBy: null, returnedAt: null, approvedBy: null, approvedAt: null },
      { transaction: t },
    );
    await recordEvent({ userId: actor.userId, farmId: plan.farmId, entity: 'plan', entityId: plan.id, action: 'revision-started', detail: { revision } }, t);
    return;
  }
  await plan.update({ version: plan.version + 1 }, { transaction: t });
}
