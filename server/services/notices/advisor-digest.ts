// The farmer's daily digest of what the farm's advisors changed the day before (UTC), one mail
// per farm and farmer and day (the outbox's dedupe key keeps a rerun from sending it twice).
import type { Sequelize } from 'sequelize';
import type { Config } from '../../config';
import { advisorChanges, type AdvisorChange } from '../../models/audit-event.queries';
import { advisorDigestMail } from '../mail/mail-templates';
import { queueMail } from '../mail/outbox';
import { noticeRecipients } from './recipients';

const RECORD_WORDS: Record<string, string> = {
  field: 'field outlines',
  cropping: 'cropping',
  ground: 'slope and ground',
  climate: 'climate and design storm',
  soil_sample: 'soil samples',
  soil_photo: 'soil photos',
  soil_map: 'the soil map',
  'factor-override': 'factor overrides',
  farm_prices: 'the price list',
  season: 'seasons',
  elevation_model: 'the elevation model',
  plan: 'the season plan',
  plan_action: 'planned actions',
  plan_comment: 'comments on the season plan',
};

const line = (c: AdvisorChange) => `${c.advisorName}: ${RECORD_WORDS[c.entity] ?? c.entity.replace(/[_-]/g, ' ')}, ${c.action} (${c.count} ${c.count === 1 ? 'time' : 'times'})`;

/** Queues the digest for the UTC day before `now`; gives how many mails were queued. */
export async function sendAdvisorDigests(sequelize: Sequelize, config: Pick<Config, 'publicUrl'>, now = new Date()): Promise<number> {
  const until = new Date(Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate()));
  const since = new Date(until.getTime() - 24 * 3600 * 1000);
  const day = since.toISOString().slice(0, 10);
  const byFarm = new Map<number, AdvisorChange[]>();
  for (const c of await advisorChanges(sequelize, since, until)) byFarm.set(c.farmId, [...(byFarm.get(c.farmId) ?? []), c]);
  let queued = 0;
  for (const [farmId, changes] of byFarm) {
    const farmers = await noticeRecipients('advisor-digest', { farmId, roles: ['farmer'] });
    const mail = advisorDigestMail({ farmName: changes[0].farmName, day, lines: changes.map(line), link: `${config.publicUrl}/farms/${farmId}` });
    await sequelize.transaction(async (t) => {
      for (const f of farmers) {
        if (await queueMail({ to: f.email, kind: 'advisor-digest', userId: f.userId, farmId, dedupeKey: `advisor-digest:${farmId}:${f.userId}:${day}` }, mail, t)) queued++;
      }
    });
  }
  return queued;
}
