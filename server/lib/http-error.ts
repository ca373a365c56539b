// Typed errors with an HTTP status and a stable code; one handler answers them all.
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
  }
}

export const badRequest = (code: string, message: string, details?: unknown) => new HttpError(400, code, message, details);
export const invalid = (code: string, message: string, details?: unknown) => new HttpError(422, code, message, details);
export const unauthorized = (message = 'Sign in first.') => new HttpError(401, 'not_signed_in', message);
export const forbidden = (message = 'Your role on this farm does not allow that.') => new HttpError(403, 'forbidden', message);
export const notFound = (what = 'That') => new HttpError(404, 'not_found', `${what} was not found, or you are not a member of its farm.`);
export const conflict = (code: string, message: string, details?: unknown) => new HttpError(409, code, message, details);
export const tooLarge = (message: string) => new HttpError(413, 'too_large', message);
export const unsupportedType = (message: string) => new HttpError(415, 'unsupported_file_type', message);
export const gone = (code: string, message: string) => new HttpError(410, code, message);
export const tooMany = (code: string, message: string) => new HttpError(429, code, message);
