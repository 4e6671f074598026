import type { RequestHandler } from 'express';
import type { DataSource } from 'typeorm';
import { hasRole, type Role } from '../../shared/schemas/common';
import { User } from '../db/entities/user.entity';
import { Forbidden, Unauthorized } from '../errors/http-error';

/** Loads the session's user; a disabled account or an outdated session epoch signs the session out. */
export function authenticate(dataSource: DataSource): RequestHandler {
  const users = dataSource.getRepository(User);
  return async (req, _res, next) => {
    const id = req.session?.userId;
    if (!id) return next();
    const user = await users.findOneBy({ id });
    if (!user || user.disabledAt || (req.session.epoch ?? 0) !== user.sessionEpoch) {
      delete req.session.userId;
      delete req.session.epoch;
      return next();
    }
    req.user = user;
    next();
  };
}

/** Lets the request through only for a signed-in user with at least `min`. */
export function requireRole(min: Role): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) throw new Unauthorized();
    if (!hasRole(req.user.role, min)) throw new Forbidden();
    next();
  };
}

/** Any signed-in user. */
export const requireUser: RequestHandler = requireRole('viewer');
