// Access for /api/soil-samples/:sampleId and /api/soil-photos/:photoId: the row's field decides,
// exactly as for the field itself (a landowner reaches only the fields they own; anything else
// is a 404 so other farms' rows do not leak).
import type { RequestHandler } from 'express';
import { Field, SoilPhoto, SoilSample } from '../models';
import { notFound } from '../lib/http-error';
import { membershipOf } from './farm-access';
import { parseId } from './validate';

type FieldOf = (id: number) => Promise<{ fieldId: number; field?: Field } | null>;

function loadThroughField(param: 'sampleId' | 'photoId', what: string, rowOf: FieldOf): RequestHandler {
  return async (req, res, next) => {
    const id = parseId(req.params[param] as string | undefined, param);
    const row = await rowOf(id);
    const field = row?.field;
    const m = field ? await membershipOf(req.user!.id, field.farmId) : null;
    if (!row || !field || !m || (m.role === 'landowner' && field.ownerMembershipId !== m.id)) throw notFound(what);
    req.membership = m;
    res.locals.fieldId = row.fieldId;
    res.locals[param] = id;
    next();
  };
}

const withField = { attributes: ['id', 'fieldId'], include: [{ model: Field, as: 'field', attributes: ['farmId', 'ownerMembershipId'] }] };

export const loadSampleMembership = loadThroughField('sampleId', 'That soil sample', (id) => SoilSample.findByPk(id, withField));
export const loadPhotoMembership = loadThroughField('photoId', 'That soil photo', (id) => SoilPhoto.findByPk(id, withField));
