// Reminders a set number of days (REMINDER_DAYS) before a planned action's date (its day, or the
// first day of its window), to the farm's farmers: one mail per farm listing that day's work. Only
// actions still planned, of plans past the draft stage. The outbox's dedupe key (action, date,
// person) keeps a rerun on the same day from sending twice.
import { Op, type Sequelize } from 'sequelize';
import type { Config } from '../../config';
import { Farm, Field, Plan, PlanAction, Season } from '../../models';
import { actionReminderMail } from '../mail/mail-templates';
import { queueMail } from '../mail/outbox';
import { planLink } from './plan-notices';
import { noticeRecipients } from './recipients';

type Due = PlanAction & { plan: Plan & { season: Season; farm: Farm }; field: Field };

/** Queues the reminders for work due `reminderDays` after `now`'s UTC day; gives how many mails were queued. */
export async function sendActionReminders(sequelize: Sequelize, config: Pick<Config, 'reminderDays'>, now = new Date()): Promise<number> {
  const day = new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate() + config.reminderDays)).toISOString().slice(0, 10);
  const due = (await PlanAction.findAll({
    where: { status: 'planned', [Op.or]: [{ plannedOn: day }, { plannedFrom: day }] },
    include: [
      { model: Plan, as: 'plan', attributes: ['id', 'farmId', 'state'], where: { state: { [Op.ne]: 'draft' } }, include: [{ model: Season, as: 'season', attributes: ['label'] }, { model: Farm, as: 'farm', attributes: ['name'] }] },
      { model: Field, as: 'field', attributes: ['name'] },
    ],
    order: [['id', 'ASC']],
  })) as Due[];
  const byFarm = new Map<number, Due[]>();
  for (const a of due) byFarm.set(a.plan.farmId, [...(byFarm.get(a.plan.farmId) ?? []), a]);
  let queued = 0;
  for (const [farmId, actions] of byFarm) {
    const farmers = await noticeRecipients('action-reminder', { farmId, roles: ['farmer'] });
    const mail = actionReminderMail({
      farmName: actions[0].plan.farm.name,
      days: config.reminderDays,
      actions: actions.map((a) => ({ title: a.title, fieldName: a.field.name, date: day })),
      link: planLink(farmId, actions[0].plan.season.label),
    });
    await sequelize.transaction(async (t) => {
      for (const f of farmers) {
        const key = `action-reminder:${farmId}:${f.userId}:${day}:${actions.map((a) => a.id).join(',')}`;
        if (await queueMail({ to: f.email, kind: 'action-reminder', userId: f.userId, farmId, dedupeKey: key }, mail, t)) queued++;
      }
    });
  }
  return queued;
}
