// The hook the season plan's review calls, inside its transaction: a plan submitted → its farm's
// advisors; returned → the farmers; approved → the farmers and the landowners of the fields the
// plan touches. Each person may have turned that kind of notice off; whoever acted gets none.
import type { Transaction } from 'sequelize';
import { Farm, Field, PlanAction, Season, User, type Plan } from '../../models';
import { planApprovedMail, planReturnedMail, planSubmittedMail } from '../mail/mail-templates';
import { publicUrl, queueMail } from '../mail/outbox';
import { noticeRecipients, type Recipient } from './recipients';

export type PlanEvent = { plan: Plan; event: 'submitted' | 'returned' | 'approved'; actorId: number; comment?: string | null };

/** Where a mail's link opens the season plan. */
export const planLink = (farmId: number, season: string) => `${publicUrl()}/farms/${farmId}/plan?season=${encodeURIComponent(season)}`;

export async function noticePlanEvent({ plan, event, actorId, comment }: PlanEvent, t: Transaction): Promise<void> {
  // One after another: the transaction's connection runs one query at a time.
  const farm = await Farm.findByPk(plan.farmId, { attributes: ['name'], transaction: t });
  const season = await Season.findByPk(plan.seasonId, { attributes: ['label'], transaction: t });
  const actor = await User.findByPk(actorId, { attributes: ['name'], transaction: t });
  const base = { farmName: farm!.name, season: season!.label, by: actor?.name ?? 'Someone', link: planLink(plan.farmId, season!.label) };
  const send = async (to: Recipient[], kind: string, mail: ReturnType<typeof planSubmittedMail>) => {
    for (const r of to.filter((x) => x.userId !== actorId)) await queueMail({ to: r.email, kind, userId: r.userId, farmId: plan.farmId }, mail, t);
  };
  if (event === 'submitted') {
    await send(await noticeRecipients('plan-submitted', { farmId: plan.farmId, roles: ['advisor'] }, t), 'plan-submitted', planSubmittedMail(base));
  } else if (event === 'returned') {
    await send(await noticeRecipients('plan-returned', { farmId: plan.farmId, roles: ['farmer'] }, t), 'plan-returned', planReturnedMail({ ...base, comment: comment ?? null }));
  } else {
    await send(await noticeRecipients('plan-approved', { farmId: plan.farmId, roles: ['farmer'] }, t), 'plan-approved', planApprovedMail({ ...base, forLandowner: false }));
    const owners = await Field.ownerUserIdsOf(await PlanAction.fieldIdsOfPlan(plan.id, t), t);
    await send(await noticeRecipients('plan-approved', { userIds: owners }, t), 'plan-approved', planApprovedMail({ ...base, forLandowner: true }));
  }
}
