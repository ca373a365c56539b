// Access for /api/soil-samples/:sampleId and /api/soil-photos/:photoId: the row's field decides,
// exactly as for the field itself (a landowner reaches only the fields they own; anything else
// is a 404 so other farms' rows do not leak).
import type { RequestHandler } from 'express';
import { QueryTypes, type Sequelize } from 'sequelize';
import { notFound } from '../../lib/http-error';
import { membershipOf } from '../../middleware/farm-access';
import { parseId } from '../../middleware/validate';

type Owned = { table: 'soil_samples' | 'soil_photos'; param: 'sampleId' | 'photoId'; what: string };

function loadThroughField(sequelize: Sequelize, { table, param, what }: Owned): RequestHandler {
  return async (req, res, next) => {
    const id = parseId(req.params[param] as string | undefined, param);
    const [row] = await sequelize.query<{ field_id: number; farm_id: number; owner_membership_id: number | null }>(
      `SELECT x.field_id, f.farm_id, f.owner_membership_id FROM ${table} x JOIN fields f ON f.id = x.field_id WHERE x.id = :id`,
      { replacements: { id }, type: QueryTypes.SELECT },
    );
    const m = row ? await membershipOf(req.user!.id, row.farm_id) : null;
    if (!row || !m || (m.role === 'landowner' && row.owner_membership_id !== m.id)) throw notFound(what);
    req.membership = m;
    res.locals.fieldId = row.field_id;
    res.locals[param] = id;
    next();
  };
}

export const loadSampleMembership = (sequelize: Sequelize) => loadThroughField(sequelize, { table: 'soil_samples', param: 'sampleId', what: 'That soil sample' });
export const loadPhotoMembership = (sequelize: Sequelize) => loadThroughField(sequelize, { table: 'soil_photos', param: 'photoId', what: 'That soil photo' });
