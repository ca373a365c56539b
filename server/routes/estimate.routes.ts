import { Router } from 'express';
import { EstimateInput } from '../../shared/schemas/estimate';
import { validate } from '../middleware/validate';
import { runEstimate } from '../services/estimate.service';

/** POST /api/estimate: the engine on typed inputs, without a field. */
export function estimateRoutes(): Router {
  const r = Router();
  r.post('/', validate(EstimateInput), (req, res) => {
    res.json(runEstimate(req.body));
  });
  return r;
}
