// Stores the samples of an uploaded CSV: all or nothing, unless the person accepts the good
// rows of a file that also has bad ones. One transaction; the field's assessments are
// refreshed once after it.
import type { Sequelize } from 'sequelize';
import { HttpError, invalid } from '../../lib/http-error';
import { SoilSample } from '../../models';
import { afterInputsChange } from '../input-changes.service';
import { parseSoilCsv } from './parse-soil-csv';
import { insertSample, sampleFieldOf } from './soil-samples.service';

export const SOIL_CSV_LIMIT_BYTES = 1024 * 1024;

export async function importSoilCsv(
  sequelize: Sequelize,
  actor: { userId: number },
  fieldId: number,
  file: { buffer: Buffer; originalName: string },
  options: { acceptGoodRows: boolean },
): Promise<{ created: SoilSample[]; rejected: { row: number; reason: string }[] }> {
  const parsed = parseSoilCsv(file.buffer);
  if (!parsed.ok) throw new HttpError(parsed.status, parsed.error, parsed.message);
  const { rows, rejected } = parsed;
  if (rejected.length > 0 && (!options.acceptGoodRows || rows.length === 0)) {
    const n = rejected.length;
    const advice = rows.length > 0
      ? ` Fix ${n === 1 ? 'it' : 'them'} and upload again, or choose to store only the ${rows.length} good row${rows.length === 1 ? '' : 's'}.`
      : ' Fix the file and upload it again.';
    throw invalid('csv_rows_invalid', `${n} row${n === 1 ? '' : 's'} of ${file.originalName || 'the CSV'} cannot be used, so nothing was stored. First problem: ${rejected[0].reason}.${advice}`, {
      rejected,
    });
  }
  const { created, field } = await sequelize.transaction(async (t) => {
    const field = await sampleFieldOf(fieldId, t);
    const ids: number[] = [];
    for (const r of rows) ids.push((await insertSample(actor, field, r.input, t)).id);
    return { created: await SoilSample.scope('oldestFirst').findAll({ where: { id: ids }, transaction: t }), field };
  });
  await afterInputsChange({ sequelize }, { kind: 'soils', farmId: field.farmId, fieldIds: [field.id] }, actor);
  return { created, rejected };
}
