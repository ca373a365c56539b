import type { RequestHandler } from 'express';
import type { z } from 'zod';
import { badRequest } from '../lib/http-error';

/** Zod issues as [{ path, message }] and one sentence naming the first field. */
export function describeIssues(error: z.ZodError): { message: string; issues: { path: string; message: string }[] } {
  const issues = error.issues.map((i) => ({ path: i.path.join('.') || '(body)', message: i.message }));
  const first = issues[0];
  const more = issues.length > 1 ? ` (and ${issues.length - 1} more)` : '';
  return { message: `${first.path}: ${first.message}${more}`, issues };
}

/** The parsed value, or a 400 naming the first field that is wrong. */
function parsed<S extends z.ZodType>(schema: S, value: unknown): z.output<S> {
  const r = schema.safeParse(value ?? {});
  if (!r.success) {
    const d = describeIssues(r.error);
    throw badRequest('invalid_input', d.message, { issues: d.issues });
  }
  return r.data;
}

/** Parses req.body with a shared schema; the parsed value replaces the body. */
export function validate<S extends z.ZodType>(schema: S): RequestHandler {
  return (req, _res, next) => {
    req.body = parsed(schema, req.body);
    next();
  };
}

export function parseId(value: string | undefined, what: string): number {
  const n = Number(value);
  if (!Number.isInteger(n) || n <= 0 || n > 2_147_483_647) throw badRequest('invalid_id', `${what} must be a positive whole number.`);
  return n;
}

/** Parses req.query with a shared schema; the parsed value is res.locals.query (Express 5's req.query cannot be replaced). */
export function validateQuery<S extends z.ZodType>(schema: S): RequestHandler {
  return (req, res, next) => {
    res.locals.query = parsed(schema, req.query);
    next();
  };
}
