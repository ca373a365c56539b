// The once-a-day job: the advisor digest (and, once season plans exist, reminders before planned work).
import type { Sequelize } from 'sequelize';
import type { Config } from '../../config';
import { sendAdvisorDigests } from './advisor-digest';

export function dailyNoticesHandler(sequelize: Sequelize, config: Pick<Config, 'publicUrl' | 'reminderDays'>) {
  return async (): Promise<void> => {
    const digests = await sendAdvisorDigests(sequelize, config);
    if (digests) console.log(`Daily notices: ${digests} advisor digest${digests === 1 ? '' : 's'} queued.`);
  };
}
