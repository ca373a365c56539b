// Query keys of seasons, cropping, climate, ground and assessments, and what a change of any
// input makes stale: every assessment, every board and every treatments answer (the server stores
// fresh assessments on each change, and the treatments start from them).
import type { QueryClient } from '@tanstack/react-query';
import { treatmentsRootKey } from '../../../lib/query-keys';

export const assessmentsRootKey = ['assessments'] as const;
export const boardsRootKey = ['board'] as const;

/** After any input of an assessment changed: read assessments, boards and treatments again. */
export function invalidateAssessments(queryClient: QueryClient) {
  void queryClient.invalidateQueries({ queryKey: assessmentsRootKey });
  void queryClient.invalidateQueries({ queryKey: boardsRootKey });
  void queryClient.invalidateQueries({ queryKey: treatmentsRootKey });
}

/** The record the server holds now, from a 409 answer's details.current, if it sent one. */
export function currentFromConflict<T>(error: unknown): T | null {
  if (!(error instanceof Error) || !('status' in error) || (error as { status: number }).status !== 409) return null;
  const current = ((error as { details?: unknown }).details as { current?: T } | undefined)?.current;
  return current ?? null;
}
