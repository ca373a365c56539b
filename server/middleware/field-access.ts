// For /api/fields/:fieldId: the field's farm membership decides; a landowner reaches only
// the fields they own, and everything else is a 404 so other fields' existence does not leak.
import type { RequestHandler } from 'express';
import { Field } from '../models';
import { notFound } from '../lib/http-error';
import { parseId } from './validate';
import { callerMembership } from './farm-access';

export const loadFieldMembership: RequestHandler = async (req, res, next) => {
  const fieldId = parseId(req.params.fieldId as string | undefined, 'fieldId');
  const field = await Field.findByPk(fieldId, { attributes: ['id', 'farmId', 'ownerMembershipId'] });
  const m = field ? callerMembership(req, field.farmId) : null;
  if (!field || !m || (m.role === 'landowner' && field.ownerMembershipId !== m.id)) throw notFound('That field');
  req.membership = m;
  res.locals.fieldId = fieldId;
  next();
};
