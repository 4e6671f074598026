import rateLimit, { ipKeyGenerator } from 'express-rate-limit';
import { HttpError } from '../errors/http-error';

/** Limits sign-in and other credential posts per client address and e-mail. */
export function credentialLimiter(limit: number, windowMs = 15 * 60_000) {
  return rateLimit({
    windowMs,
    limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? '')}|${String(req.body?.email ?? '').toLowerCase().slice(0, 254)}`,
    handler: (_req, _res, next) => next(new HttpError(429, 'rate_limited', 'Too many attempts. Wait a few minutes and try again.')),
  });
}

/** A looser limit for messages that send e-mail (reset and verification links). */
export function mailLimiter(limit = 5, windowMs = 15 * 60_000) {
  return rateLimit({
    windowMs,
    limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? '')}|${String(req.body?.email ?? '').toLowerCase().slice(0, 254)}`,
    handler: (_req, _res, next) => next(new HttpError(429, 'rate_limited', 'Too many links have been asked for that e-mail address. Wait a few minutes and try again.')),
  });
}
