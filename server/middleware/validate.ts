import type { RequestHandler } from 'express';
import { z } from 'zod';
import { idSchema } from '../../shared/schemas/common';

/** A numeric id in a path (`/tours/:id`), as shared with the client; anything else is a 400 through the zod error mapping. */
export const idParam = idSchema;

/** Parses req.body with the shared schema; the parsed value replaces the body. */
export function validateBody<S extends z.ZodTypeAny>(schema: S): RequestHandler {
  return (req, _res, next) => {
    req.body = schema.parse(req.body ?? {});
    next();
  };
}

/** Parses req.query with the shared schema into res.locals.query (Express 5's req.query is read-only). */
export function validateQuery<S extends z.ZodTypeAny>(schema: S): RequestHandler {
  return (req, res, next) => {
    res.locals.query = schema.parse(req.query);
    next();
  };
}

/** The query parsed by validateQuery, typed. */
export function parsedQuery<S extends z.ZodTypeAny>(res: { locals: Record<string, unknown> }, _schema: S): z.infer<S> {
  return res.locals.query as z.infer<S>;
}
