// Reads across audit events and memberships: what each farm's advisors changed in a time window,
// counted by kind of record, for the farmer's daily digest.
import { QueryTypes, type Sequelize } from 'sequelize';

export type AdvisorChange = { farmId: number; farmName: string; advisorName: string; entity: string; action: string; count: number };

export async function advisorChanges(sequelize: Sequelize, since: Date, until: Date): Promise<AdvisorChange[]> {
  return sequelize.query<AdvisorChange>(
    `SELECT e.farm_id AS "farmId", f.name AS "farmName", u.name AS "advisorName", e.entity, e.action, count(*)::int AS count
       FROM audit_events e
       JOIN memberships m ON m.user_id = e.user_id AND m.farm_id = e.farm_id AND m.role = 'advisor'
       JOIN users u ON u.id = e.user_id
       JOIN farms f ON f.id = e.farm_id
      WHERE e.created_at >= $since AND e.created_at < $until
      GROUP BY e.farm_id, f.name, u.name, e.entity, e.action
      ORDER BY e.farm_id, u.name, e.entity, e.action`,
    { bind: { since, until }, type: QueryTypes.SELECT },
  );
}
