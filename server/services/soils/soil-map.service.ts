// A farm's soil map: upload (replaces the previous one, in one transaction), the attribute
// names found with sample values, the person's mapping of names to meanings, and removal.
import { QueryTypes, type Sequelize, type Transaction } from 'sequelize';
import { SOIL_MAP_MEANINGS, type MappingCheck, type SoilMapInfo, type SoilMapMapping, type SoilMapMeaning } from '../../../shared/schemas/soils';
import { HttpError, invalid, notFound } from '../../lib/http-error';
import { recordEvent } from '../audit';
import { afterInputsChange } from '../input-changes.service';
import { EMPTY_MAPPING, guessMapping, readMeaning, type StoredMapping } from './map-unit-values';
import { readSoilMapFile } from './read-soil-map-file';

type MapRow = { id: number; original_name: string; attribute_names: string[]; mapping: Partial<StoredMapping>; warnings: string[]; created_at: Date; unit_count: number };

const SAMPLE_VALUES = 5;
const EXAMPLES = 3;

async function mapRow(sequelize: Sequelize, farmId: number, transaction?: Transaction): Promise<MapRow | undefined> {
  const [row] = await sequelize.query<MapRow>(
    `SELECT m.id, m.original_name, m.attribute_names, m.mapping, m.warnings, m.created_at,
            (SELECT count(*)::int FROM soil_map_units u WHERE u.soil_map_id = m.id) AS unit_count
       FROM soil_maps m WHERE m.farm_id = :farmId`,
    { replacements: { farmId }, type: QueryTypes.SELECT, transaction },
  );
  return row;
}

const mappingOf = (row: MapRow): StoredMapping => ({ ...EMPTY_MAPPING, ...row.mapping });

async function checks(sequelize: Sequelize, mapId: number, m: StoredMapping, transaction?: Transaction): Promise<SoilMapInfo['checks']> {
  const mapped = SOIL_MAP_MEANINGS.filter((k) => m[k] !== null);
  if (mapped.length === 0) return {};
  const rows = await sequelize.query<{ v: Record<string, unknown> }>(
    `SELECT jsonb_build_object(${mapped.map((k) => `'${k}', u.attributes -> :${k}`).join(', ')}) AS v FROM soil_map_units u WHERE u.soil_map_id = :mapId`,
    { replacements: { mapId, ...Object.fromEntries(mapped.map((k) => [k, m[k]])) }, type: QueryTypes.SELECT, transaction },
  );
  const out: SoilMapInfo['checks'] = {};
  for (const k of mapped) {
    const c: MappingCheck = { attribute: m[k] as string, understood: 0, notUnderstood: 0, examples: [] };
    for (const { v } of rows) {
      if (readMeaning(k, v[k], m.kUnits) !== null) c.understood++;
      else {
        c.notUnderstood++;
        const shown = v[k] === null || v[k] === undefined ? '(empty)' : String(v[k]).slice(0, 60);
        if (c.examples.length < EXAMPLES && !c.examples.includes(shown)) c.examples.push(shown);
      }
    }
    out[k] = c;
  }
  return out;
}

export async function soilMapInfo(sequelize: Sequelize, farmId: number, transaction?: Transaction): Promise<SoilMapInfo> {
  const row = await mapRow(sequelize, farmId, transaction);
  if (!row) return { map: null, attributes: [], mapping: { ...EMPTY_MAPPING }, checks: {} };
  const stats = await sequelize.query<{ name: string; distinct_values: number; sample_values: string[] }>(
    `SELECT e.key AS name, count(DISTINCT e.value)::int AS distinct_values, (array_agg(DISTINCT e.value))[1:${SAMPLE_VALUES}] AS sample_values
       FROM soil_map_units u, jsonb_each_text(u.attributes) AS e(key, value)
      WHERE u.soil_map_id = :mapId AND e.value IS NOT NULL AND e.value <> ''
      GROUP BY e.key`,
    { replacements: { mapId: row.id }, type: QueryTypes.SELECT, transaction },
  );
  const byName = new Map(stats.map((s) => [s.name, s]));
  const mapping = mappingOf(row);
  return {
    map: { id: row.id, originalName: row.original_name, unitCount: row.unit_count, uploadedAt: new Date(row.created_at).toISOString(), warnings: row.warnings },
    attributes: row.attribute_names.map((name) => ({
      name,
      sampleValues: byName.get(name)?.sample_values ?? [],
      distinctValues: byName.get(name)?.distinct_values ?? 0,
    })),
    mapping,
    checks: await checks(sequelize, row.id, mapping, transaction),
  };
}

export async function uploadSoilMap(
  sequelize: Sequelize,
  actor: { userId: number },
  farmId: number,
  file: { buffer: Buffer; originalName: string },
): Promise<SoilMapInfo & { rejected: { index: number; reason: string }[] }> {
  const read = await readSoilMapFile(file);
  if (!read.ok) throw new HttpError(read.status, read.error, read.message);
  const names: string[] = [];
  for (const u of read.units) for (const k of Object.keys(u.properties)) if (!names.includes(k)) names.push(k);
  const info = await sequelize.transaction(async (t) => {
    // One upload per farm at a time: the farm row is the lock, so two uploads cannot both replace the map.
    await sequelize.query('SELECT id FROM farms WHERE id = :farmId FOR UPDATE', { replacements: { farmId }, transaction: t });
    const previous = await mapRow(sequelize, farmId, t);
    await sequelize.query('DELETE FROM soil_maps WHERE farm_id = :farmId', { replacements: { farmId }, transaction: t });
    const mapping = guessMapping(names, previous ? mappingOf(previous) : undefined);
    const [map] = await sequelize.query<{ id: number }>(
      `INSERT INTO soil_maps (farm_id, original_name, attribute_names, mapping, created_by)
       VALUES (:farmId, :name, CAST(:names AS jsonb), CAST(:mapping AS jsonb), :userId) RETURNING id`,
      { replacements: { farmId, name: file.originalName.slice(0, 200) || 'soil map', names: JSON.stringify(names), mapping: JSON.stringify(mapping), userId: actor.userId }, type: QueryTypes.SELECT, transaction: t },
    );
    // Map units are not drawn by the person, so invalid rings are repaired (ST_MakeValid) and counted, not refused.
    const results = read.units.length === 0 ? [] : await sequelize.query<{ idx: number; was_valid: boolean; stored: boolean }>(
      `WITH src AS (
         SELECT (u->>'index')::int AS idx, COALESCE(u->'properties', '{}'::json)::jsonb AS props,
                ST_SetSRID(ST_GeomFromGeoJSON(u->>'geometry'), 4326) AS g
           FROM json_array_elements(CAST(:units AS json)) u),
       fixed AS (
         SELECT idx, props, ST_IsValid(g) AS was_valid,
                CASE WHEN ST_IsValid(g) THEN ST_Multi(g) ELSE ST_Multi(ST_CollectionExtract(ST_MakeValid(g), 3)) END AS g FROM src),
       ins AS (
         INSERT INTO soil_map_units (soil_map_id, feature_index, attributes, geom)
         SELECT :mapId, idx, props, g FROM fixed WHERE NOT ST_IsEmpty(g) RETURNING id)
       SELECT idx, was_valid, NOT ST_IsEmpty(g) AS stored FROM fixed ORDER BY idx`,
      {
        replacements: { mapId: map.id, units: JSON.stringify(read.units.map((u) => ({ index: u.index, properties: u.properties, geometry: JSON.stringify(u.geometry) }))) },
        type: QueryTypes.SELECT,
        transaction: t,
      },
    );
    const rejected = [...read.rejected];
    for (const r of results) if (!r.stored) rejected.push({ index: r.idx, reason: `feature ${r.idx}: its outline has no area left once repaired` });
    rejected.sort((a, b) => a.index - b.index);
    const stored = results.filter((r) => r.stored).length;
    if (stored === 0) {
      throw invalid('nothing_imported', `No map unit in ${file.originalName || 'the file'} could be used, so nothing was stored.${rejected[0] ? ` First problem: ${rejected[0].reason}` : ''}`, { rejected });
    }
    const repaired = results.filter((r) => r.stored && !r.was_valid).length;
    const warnings = [...read.warnings, ...(repaired ? [`${repaired} map unit outline${repaired === 1 ? ' was' : 's were'} invalid (for example self-intersecting) and repaired`] : [])];
    await sequelize.query('UPDATE soil_maps SET warnings = CAST(:w AS jsonb) WHERE id = :id', { replacements: { w: JSON.stringify(warnings), id: map.id }, transaction: t });
    await recordEvent({ userId: actor.userId, farmId, entity: 'soil_map', entityId: map.id, action: 'uploaded', detail: { units: stored, rejected: rejected.length, attributes: names.length } }, t);
    return { ...(await soilMapInfo(sequelize, farmId, t)), rejected };
  });
  await soilMapChanged(sequelize, actor, farmId);
  return info;
}

export async function setSoilMapMapping(sequelize: Sequelize, actor: { userId: number }, farmId: number, body: SoilMapMapping): Promise<SoilMapInfo> {
  const info = await sequelize.transaction(async (t) => {
    const row = await mapRow(sequelize, farmId, t);
    if (!row) throw notFound('A soil map for this farm');
    const mapping = mappingOf(row);
    for (const k of SOIL_MAP_MEANINGS) {
      const name = body[k];
      if (name === undefined) continue;
      if (name !== null && !row.attribute_names.includes(name)) {
        throw invalid('unknown_attribute', `${k}: the soil map has no attribute "${name}"; its attributes are ${row.attribute_names.join(', ') || '(none)'}.`);
      }
      mapping[k as SoilMapMeaning] = name;
    }
    if (body.kUnits) mapping.kUnits = body.kUnits;
    await sequelize.query('UPDATE soil_maps SET mapping = CAST(:m AS jsonb), updated_at = now() WHERE id = :id', { replacements: { m: JSON.stringify(mapping), id: row.id }, transaction: t });
    await recordEvent({ userId: actor.userId, farmId, entity: 'soil_map', entityId: row.id, action: 'mapped', detail: { mapping } }, t);
    return soilMapInfo(sequelize, farmId, t);
  });
  await soilMapChanged(sequelize, actor, farmId);
  return info;
}

export async function deleteSoilMap(sequelize: Sequelize, actor: { userId: number }, farmId: number): Promise<void> {
  await sequelize.transaction(async (t) => {
    const [row] = await sequelize.query<{ id: number }>('DELETE FROM soil_maps WHERE farm_id = :farmId RETURNING id', { replacements: { farmId }, type: QueryTypes.SELECT, transaction: t });
    if (!row) throw notFound('A soil map for this farm');
    await recordEvent({ userId: actor.userId, farmId, entity: 'soil_map', entityId: row.id, action: 'deleted' }, t);
  });
  await soilMapChanged(sequelize, actor, farmId);
}

/** After the commit: the soil summaries read the committed map. */
async function soilMapChanged(sequelize: Sequelize, actor: { userId: number }, farmId: number): Promise<void> {
  await afterInputsChange({ sequelize }, { kind: 'soils', farmId }, actor);
}
