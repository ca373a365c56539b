// A farm's soil map: upload (replaces the previous one, in one transaction), the attribute
// names found with sample values, the person's mapping of names to meanings, and removal.
// Each change of the map or its mapping changes every field's soil figures, so the farm's
// assessments are refreshed after it.
import type { Sequelize, Transaction } from 'sequelize';
import { SOIL_MAP_MEANINGS, type MappingCheck, type SoilMapInfo, type SoilMapMapping, type SoilMapMeaning } from '../../../shared/schemas/soils';
import { HttpError, invalid, notFound } from '../../lib/http-error';
import { Farm, SoilMap, SoilMapUnit } from '../../models';
import type { StoredMapping } from '../../models/soil-map.model';
import { attributeValueStats, insertMapUnits, mappedAttributeValues } from '../../models/soil-map-unit.queries';
import type { SoilMapState } from '../../presenters/soil-map.presenter';
import { recordEvent } from '../audit';
import { afterInputsChange } from '../input-changes.service';
import { EMPTY_MAPPING, guessMapping, readMeaning } from './map-unit-values';
import { readSoilMapFile } from './read-soil-map-file';

type Actor = { userId: number };

const SAMPLE_VALUES = 5;
const EXAMPLES = 3;

const mappingOf = (map: SoilMap): StoredMapping => ({ ...EMPTY_MAPPING, ...map.mapping });

async function mappingChecks(sequelize: Sequelize, map: SoilMap, m: StoredMapping, transaction?: Transaction): Promise<SoilMapInfo['checks']> {
  const mapped = SOIL_MAP_MEANINGS.filter((k) => m[k] !== null);
  const values = await mappedAttributeValues(sequelize, map.id, Object.fromEntries(mapped.map((k) => [k, m[k] as string])), transaction);
  const out: SoilMapInfo['checks'] = {};
  for (const k of mapped) {
    const c: MappingCheck = { attribute: m[k] as string, understood: 0, notUnderstood: 0, examples: [] };
    for (const v of values) {
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

export async function soilMapInfo(sequelize: Sequelize, farmId: number, transaction?: Transaction): Promise<SoilMapState> {
  const map = await SoilMap.findOne({ where: { farmId }, transaction });
  if (!map) return { map: null, unitCount: 0, attributeStats: [], mapping: { ...EMPTY_MAPPING }, checks: {} };
  const mapping = mappingOf(map);
  const [unitCount, attributeStats, checks] = await Promise.all([
    SoilMapUnit.count({ where: { soilMapId: map.id }, transaction }),
    attributeValueStats(sequelize, map.id, SAMPLE_VALUES, transaction),
    mappingChecks(sequelize, map, mapping, transaction),
  ]);
  return { map, unitCount, attributeStats, mapping, checks };
}

export async function uploadSoilMap(
  sequelize: Sequelize,
  actor: Actor,
  farmId: number,
  file: { buffer: Buffer; originalName: string },
): Promise<{ state: SoilMapState; rejected: { index: number; reason: string }[] }> {
  const read = await readSoilMapFile(file);
  if (!read.ok) throw new HttpError(read.status, read.error, read.message);
  const names: string[] = [];
  for (const u of read.units) for (const k of Object.keys(u.properties)) if (!names.includes(k)) names.push(k);
  const result = await sequelize.transaction(async (t) => {
    // One upload per farm at a time: the farm row is the lock, so two uploads cannot both replace the map.
    await Farm.findByPk(farmId, { attributes: ['id'], lock: t.LOCK.UPDATE, transaction: t });
    const previous = await SoilMap.findOne({ where: { farmId }, transaction: t });
    await SoilMap.destroy({ where: { farmId }, transaction: t });
    const map = await SoilMap.create(
      { farmId, originalName: file.originalName.slice(0, 200) || 'soil map', attributeNames: names, mapping: guessMapping(names, previous ? mappingOf(previous) : undefined), createdBy: actor.userId },
      { transaction: t },
    );
    const outlines = await insertMapUnits(sequelize, map.id, read.units, t);
    const rejected = [...read.rejected];
    for (const o of outlines) if (!o.stored) rejected.push({ index: o.featureIndex, reason: `feature ${o.featureIndex}: its outline has no area left once repaired` });
    rejected.sort((a, b) => a.index - b.index);
    const stored = outlines.filter((o) => o.stored).length;
    if (stored === 0) {
      throw invalid('nothing_imported', `No map unit in ${file.originalName || 'the file'} could be used, so nothing was stored.${rejected[0] ? ` First problem: ${rejected[0].reason}` : ''}`, { rejected });
    }
    const repaired = outlines.filter((o) => o.stored && !o.wasValid).length;
    const warnings = [...read.warnings, ...(repaired ? [`${repaired} map unit outline${repaired === 1 ? ' was' : 's were'} invalid (for example self-intersecting) and repaired`] : [])];
    await map.update({ warnings }, { transaction: t });
    await recordEvent({ userId: actor.userId, farmId, entity: 'soil_map', entityId: map.id, action: 'uploaded', detail: { units: stored, rejected: rejected.length, attributes: names.length } }, t);
    return { state: await soilMapInfo(sequelize, farmId, t), rejected };
  });
  await afterInputsChange({ sequelize }, { kind: 'soils', farmId }, actor);
  return result;
}

export async function setSoilMapMapping(sequelize: Sequelize, actor: Actor, farmId: number, body: SoilMapMapping): Promise<SoilMapState> {
  const state = await sequelize.transaction(async (t) => {
    const map = await SoilMap.findOne({ where: { farmId }, lock: t.LOCK.UPDATE, transaction: t });
    if (!map) throw notFound('A soil map for this farm');
    const mapping = mappingOf(map);
    for (const k of SOIL_MAP_MEANINGS) {
      const name = body[k];
      if (name === undefined) continue;
      if (name !== null && !map.attributeNames.includes(name)) {
        throw invalid('unknown_attribute', `${k}: the soil map has no attribute "${name}"; its attributes are ${map.attributeNames.join(', ') || '(none)'}.`);
      }
      mapping[k as SoilMapMeaning] = name;
    }
    if (body.kUnits) mapping.kUnits = body.kUnits;
    await SoilMap.update({ mapping }, { where: { id: map.id }, transaction: t });
    await recordEvent({ userId: actor.userId, farmId, entity: 'soil_map', entityId: map.id, action: 'mapped', detail: { mapping } }, t);
    return soilMapInfo(sequelize, farmId, t);
  });
  await afterInputsChange({ sequelize }, { kind: 'soils', farmId }, actor);
  return state;
}

export async function deleteSoilMap(sequelize: Sequelize, actor: Actor, farmId: number): Promise<void> {
  await sequelize.transaction(async (t) => {
    const map = await SoilMap.findOne({ where: { farmId }, attributes: ['id'], lock: t.LOCK.UPDATE, transaction: t });
    if (!map) throw notFound('A soil map for this farm');
    await map.destroy({ transaction: t });
    await recordEvent({ userId: actor.userId, farmId, entity: 'soil_map', entityId: map.id, action: 'deleted' }, t);
  });
  await afterInputsChange({ sequelize }, { kind: 'soils', farmId }, actor);
}
