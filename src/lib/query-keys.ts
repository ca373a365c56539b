// Query keys more than one feature reads: what a change elsewhere makes stale.

/** Every treatments answer (a field's, a farm's) and every budget plan: their costs follow the
 *  price list, their figures follow the assessment's inputs. */
export const treatmentsRootKey = ['treatments'] as const;
