// A quick estimate without a field: the engine on typed inputs; an input it cannot use is a 422
// naming the input.
import { estimate } from '../../shared/erosion';
import type { EstimateInputParsed } from '../../shared/schemas/estimate';
import { invalid } from '../lib/http-error';

export function runEstimate(input: EstimateInputParsed) {
  const result = estimate(input);
  if (!result.ok) throw invalid('cannot_estimate', result.field ? `${result.field}: ${result.reason}` : result.reason, { field: result.field ?? null });
  return result;
}
