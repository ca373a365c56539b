import type { ErrorRequestHandler, RequestHandler } from 'express';
import multer from 'multer';
import { ConnectionError, DatabaseError } from 'sequelize';
import { HttpError } from '../lib/http-error';

/** Seconds a client is asked to wait while the database cannot be reached. */
export const DATABASE_RETRY_AFTER_S = 5;

/**
 * True when the database could not be reached or went away mid-query: no connection (refused,
 * timed out, pool exhausted), or PostgreSQL's SQLSTATE class 08 (connection exception) and 57P01–
 * 57P03 (shutting down, crashed, starting up) — PostgreSQL manual, appendix A, error codes.
 */
function databaseUnavailable(err: unknown): boolean {
  if (err instanceof ConnectionError) return true;
  if (!(err instanceof DatabaseError)) return false;
  const parent = err.parent as Error & { code?: string };
  return (typeof parent.code === 'string' && (/^08/.test(parent.code) || /^57P0[123]$/.test(parent.code))) || /Connection terminated/i.test(parent.message);
}

export const notFoundApi: RequestHandler = (req, res) => {
  res.status(404).json({ error: 'not_found', message: `There is no ${req.method} ${req.path} in the API.` });
};

/** Mounted last: answers every error as { error, message, details? } and logs the unexpected. */
export const errorHandler: ErrorRequestHandler = (err, _req, res, _next) => {
  if (err instanceof HttpError) {
    res.status(err.status).json({ error: err.code, message: err.message, ...(err.details !== undefined ? { details: err.details } : {}) });
    return;
  }
  if (err instanceof multer.MulterError) {
    if (err.code === 'LIMIT_FILE_SIZE') {
      res.status(413).json({ error: 'too_large', message: 'The file is larger than the upload limit.' });
      return;
    }
    res.status(400).json({ error: 'bad_upload', message: `The upload was not understood: ${err.message} (${err.field ?? 'file'}).` });
    return;
  }
  if (databaseUnavailable(err)) {
    res.set('Retry-After', String(DATABASE_RETRY_AFTER_S));
    res.status(503).json({ error: 'database_unavailable', message: `The database cannot be reached just now. Try again in ${DATABASE_RETRY_AFTER_S} seconds.` });
    return;
  }
  // body-parser errors carry a status and type.
  const e = err as { status?: number; type?: string; message?: string };
  if (e.type === 'entity.parse.failed') {
    res.status(400).json({ error: 'malformed_json', message: 'The request body is not valid JSON.' });
    return;
  }
  if (e.type === 'entity.too.large') {
    res.status(413).json({ error: 'too_large', message: 'The request body is too large.' });
    return;
  }
  console.error(err);
  res.status(500).json({ error: 'internal', message: 'Something went wrong on the server; it has been logged.' });
};
