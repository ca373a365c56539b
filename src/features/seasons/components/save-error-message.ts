// Words for the errors a save of cropping, ground or climate can meet.
import { isApiError } from '../../../lib/api-client';

export function saveErrorMessage(error: unknown, what: string): string {
  if (isApiError(error, 409))
    return `Someone else changed the ${what} while you were working on it, so yours was not saved. Their version is now shown; make your change again.`;
  if (isApiError(error, 403)) return `Your role on this farm does not allow changing the ${what}.`;
  if (isApiError(error, 400) || isApiError(error, 422)) {
    const issues = error.issues.map((i) => i.message);
    return issues.length ? `The ${what} was not saved: ${issues.join('; ')}.` : error.message;
  }
  if (error instanceof Error) return error.message;
  return `The ${what} was not saved.`;
}
