// A farm's audit events in words for the "Recent changes" list. Pure: events, field names and
// people's names in; one sentence per change out (the person is shown beside it, not in it).
import type { FarmChange } from '../../shared/schemas/changes';
import type { AuditEvent } from '../models';

/** Records whose entity id is the field they are about. */
const FIELD_RECORDS = new Set(['field', 'cropping', 'ground', 'factor-override']);

const RECORD_WORDS: Record<string, string> = {
  farm: 'the farm',
  field: 'the field',
  cropping: 'the cropping',
  ground: 'the slope and drainage',
  'factor-override': 'a typed factor',
  climate: 'the climate and design storm',
  elevation_model: 'an elevation model',
  farm_prices: 'the price list',
  season: 'a season',
  soil_sample: 'a soil check',
  soil_photo: 'a soil photo',
  soil_map: 'the soil map',
  plan: 'the season plan',
  plan_action: 'a plan action',
  plan_comment: 'a comment on the plan',
};

const VERBS: Record<string, string> = {
  created: 'added',
  updated: 'changed',
  deleted: 'removed',
  removed: 'removed',
  uploaded: 'uploaded',
  mapped: 'matched the columns of',
  submitted: 'submitted',
  returned: 'returned',
  approved: 'approved',
  'revision-started': 'started a new revision of',
};

const str = (v: unknown): string | null => (typeof v === 'string' && v ? v : null);

function sentence(e: AuditEvent, fieldName: string | null): string {
  const d = e.detail ?? {};
  if (e.entity === 'plan_action' && e.action === 'done') return `recorded work done${str(d.doneOn) ? ` on ${d.doneOn}` : ''}${fieldName ? ` on ${fieldName}` : ''}`;
  if (e.entity === 'plan_action' && e.action === 'checked') return `checked work done${fieldName ? ` on ${fieldName}` : ''}`;
  if (e.entity === 'season') return `${VERBS[e.action] ?? e.action} season ${str(d.label) ?? ''}${str(d.copiedFrom) ? `, with the cropping of ${d.copiedFrom}` : ''}`.trim();
  if (e.entity === 'factor-override') return `${e.action === 'removed' ? 'removed' : 'typed'} ${str(d.factor)?.toUpperCase() ?? 'a factor'}${fieldName ? ` for ${fieldName}` : ''}`;
  const what = RECORD_WORDS[e.entity] ?? e.entity.replace(/_/g, ' ');
  const title = e.entity === 'plan_action' ? str(d.title) ?? str(d.treatment) : null;
  const season = str(d.season);
  const on = fieldName && e.entity !== 'field' ? ` of ${fieldName}` : e.entity === 'field' && fieldName ? ` ${fieldName}` : '';
  return `${VERBS[e.action] ?? e.action} ${what}${title ? ` (${title})` : ''}${on}${season ? ` for ${season}` : ''}`;
}

/** The field an event is about, when it names one. */
export function fieldOf(e: AuditEvent): number | null {
  if (FIELD_RECORDS.has(e.entity)) return e.entityId;
  const f = (e.detail ?? {}).fieldId;
  return typeof f === 'number' ? f : null;
}

export function presentChanges(events: AuditEvent[], fieldNames: Map<number, string>, people: Map<number, string>): FarmChange[] {
  return events.map((e) => {
    const fieldId = fieldOf(e);
    const name = fieldId == null ? null : (fieldNames.get(fieldId) ?? 'a removed field');
    return {
      id: Number(e.id),
      at: new Date(e.createdAt).toISOString(),
      by: e.userId == null ? null : { id: e.userId, name: people.get(e.userId) ?? 'a former member' },
      entity: e.entity,
      action: e.action,
      summary: sentence(e, name),
      fieldId,
    };
  });
}
