// A farm's recent changes (the audit events written with every change), newest first, with the
// names of the people and fields they mention (three queries however many events); and each
// field's soil loss across seasons.
import { Assessment, AuditEvent, Field, User } from '../models';
import { fieldOf, presentChanges } from '../presenters/change.presenter';
import type { FarmChange, SoilLossHistory } from '../../shared/schemas/changes';

export async function recentChanges(farmId: number, limit: number): Promise<FarmChange[]> {
  const events = await AuditEvent.newestOfFarm(farmId, limit);
  const fieldIds = [...new Set(events.map(fieldOf).filter((x): x is number => x != null))];
  const userIds = [...new Set(events.map((e) => e.userId).filter((x): x is number => x != null))];
  const fields = fieldIds.length ? await Field.findAll({ where: { id: fieldIds }, attributes: ['id', 'name'] }) : [];
  const users = userIds.length ? await User.findAll({ where: { id: userIds }, attributes: ['id', 'name'] }) : [];
  return presentChanges(events, new Map(fields.map((f) => [f.id, f.name])), new Map(users.map((u) => [u.id, u.name])));
}

/** Each field's stored A and A/T per season (the assessments stored for every season). */
export async function soilLossHistory(farmId: number): Promise<SoilLossHistory> {
  const rows = await Assessment.ofFarmAcrossSeasons(farmId);
  const seasons = [...new Set(rows.map((r) => r.season!.label))].sort();
  const byField = new Map<number, SoilLossHistory['fields'][number]>();
  for (const r of rows) {
    const f = byField.get(r.fieldId) ?? { fieldId: r.fieldId, fieldName: r.field!.name, points: [] };
    f.points.push({ season: r.season!.label, soilLossTPerHaYr: r.boardRow.soilLossTPerHaYr, aOverT: r.boardRow.aOverT });
    byField.set(r.fieldId, f);
  }
  for (const f of byField.values()) f.points.sort((a, b) => a.season.localeCompare(b.season));
  return { seasons, fields: [...byField.values()].sort((a, b) => a.fieldName.localeCompare(b.fieldName)) };
}
