// The once-a-day job: reminders before planned work, and the farmer's digest of an advisor's changes.
import type { Sequelize } from 'sequelize';
import type { Config } from '../../config';
import { sendAdvisorDigests } from './advisor-digest';
import { sendActionReminders } from './action-reminders';

export function dailyNoticesHandler(sequelize: Sequelize, config: Pick<Config, 'publicUrl' | 'reminderDays'>) {
  return async (): Promise<void> => {
    const reminders = await sendActionReminders(sequelize, config);
    const digests = await sendAdvisorDigests(sequelize, config);
    if (reminders || digests) console.log(`Daily notices: ${reminders} reminder mail(s) and ${digests} advisor digest(s) queued.`);
  };
}
