import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import { EntityNotFoundError, QueryFailedError } from 'typeorm';
import { MulterError } from 'multer';
import { HttpError } from './http-error';
import type { ApiErrorBody } from '../../shared/schemas/common';

/** Turns zod issues into `{ field: message }`, first message per field. */
export function zodFields(err: ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of err.issues) {
    const key = issue.path.join('.') || '_';
    if (!(key in fields)) fields[key] = issue.message;
  }
  return fields;
}

function body(code: string, message: string, fields?: Record<string, string>): ApiErrorBody {
  return { error: fields ? { code, message, fields } : { code, message } };
}

/** Unknown /api routes answer in the API's error shape rather than with the client's HTML. */
export const apiNotFound: RequestHandler = (_req, res) => {
  res.status(404).json(body('not_found', 'No such API route.'));
};

/** The one place where errors become responses. */
export function errorHandler(opts: { exposeStack: boolean; log?: (err: unknown) => void }): ErrorRequestHandler {
  const log = opts.log ?? ((err) => console.error(err));
  return (err, req, res, next) => {
    if (res.headersSent) return next(err);
    // Refused before the body was read (e.g. an upload by someone not allowed): close the
    // connection so the client stops sending instead of waiting on a half-read request.
    if (!req.complete) res.set('Connection', 'close');
    if (err instanceof HttpError) return res.status(err.status).json(body(err.code, err.message, err.fields));
    if (err instanceof ZodError) return res.status(400).json(body('invalid_input', 'Some fields need attention.', zodFields(err)));
    if (err instanceof EntityNotFoundError) return res.status(404).json(body('not_found', 'That item no longer exists, or the link is wrong.'));
    if (err instanceof MulterError) {
      const status = err.code === 'LIMIT_FILE_SIZE' ? 413 : 400;
      return res.status(status).json(body(`upload_${err.code.toLowerCase()}`, err.code === 'LIMIT_FILE_SIZE' ? 'That file is larger than the upload limit.' : 'The upload could not be read. Choose the file again and retry.'));
    }
    if (err instanceof QueryFailedError && (err as QueryFailedError & { code?: string }).code === 'ER_DUP_ENTRY') {
      return res.status(409).json(body('duplicate', 'Something with that name already exists; choose another name.'));
    }
    // body-parser errors carry a status and a type.
    const e = err as { status?: number; type?: string; message?: string };
    if (e.type === 'entity.parse.failed') return res.status(400).json(body('malformed_json', 'The request body is not valid JSON.'));
    if (e.type === 'entity.too.large') return res.status(413).json(body('too_large', 'The request body is too large.'));
    if (typeof e.status === 'number' && e.status >= 400 && e.status < 500) {
      return res.status(e.status).json(body('bad_request', 'The request could not be read. Reload the page and try again.'));
    }
    log(err);
    const message = opts.exposeStack && err instanceof Error ? `Something went wrong on our side. ${err.stack}` : 'Something went wrong on our side.';
    return res.status(500).json(body('internal', message));
  };
}
