// Words for the errors an edit of a field can meet.
import { isApiError } from '../../../lib/api-client';

export function fieldEditErrorMessage(error: unknown, what: string): string {
  if (isApiError(error, 409))
    return `Someone else changed this field while you were working on it, so your ${what} was not saved. The latest version is now shown; make your change again.`;
  if (isApiError(error, 403)) return `Your role on this farm does not allow changing fields, so the ${what} was not saved.`;
  if (isApiError(error, 404)) return 'This field no longer exists: someone may have deleted it.';
  if (error instanceof Error) return error.message;
  return `The ${what} was not saved.`;
}
