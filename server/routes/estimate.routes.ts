import { Router } from 'express';
import { EstimateInput } from '../../shared/schemas/estimate';
import { estimate } from '../../shared/erosion';
import { validate } from '../middleware/validate';
import { invalid } from '../lib/http-error';

/** POST /api/estimate: the engine on typed inputs, without a field (DESIGN.md API contract). */
export function estimateRoutes(): Router {
  const r = Router();
  r.post('/', validate(EstimateInput), (req, res) => {
    const result = estimate(req.body);
    if (!result.ok) throw invalid('cannot_estimate', result.field ? `${result.field}: ${result.reason}` : result.reason, { field: result.field ?? null });
    res.json(result);
  });
  return r;
}
