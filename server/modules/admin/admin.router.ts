import { Router } from 'express';
import { z } from 'zod';
import type { DataSource } from 'typeorm';
import { listUsersQuery, outboxQuery, updateUserInput } from '../../../shared/schemas/admin';
import { OutboxMessage } from '../../db/entities/outbox-message.entity';
import { NotFound } from '../../errors/http-error';
import { requireRole } from '../../middleware/auth';
import { parsedQuery, validateBody, validateQuery } from '../../middleware/validate';
import { presentAdminUser } from '../auth/user.presenter';
import type { UsersService } from './users.service';
import { likeEscape } from './users.service';

const idParam = z.coerce.number().int().min(1);

function presentMessage(m: OutboxMessage) {
  return { id: m.id, to: m.to, from: m.from, subject: m.subject, text: m.text, html: m.html, receivedAt: m.receivedAt.toISOString() };
}

/** /api/admin: users and the outbox of the local mail catcher. Admins only. */
export function adminRouter(users: UsersService, dataSource: DataSource): Router {
  const r = Router();
  r.use(requireRole('admin'));

  r.get('/users', validateQuery(listUsersQuery), async (_req, res) => {
    const page = await users.list(parsedQuery(res, listUsersQuery));
    res.json({ ...page, items: page.items.map(presentAdminUser) });
  });

  r.patch('/users/:id', validateBody(updateUserInput), async (req, res) => {
    const user = await users.update(req.user!, idParam.parse(req.params.id), req.body);
    res.json({ user: presentAdminUser(user) });
  });

  r.get('/outbox', validateQuery(outboxQuery), async (_req, res) => {
    const q = parsedQuery(res, outboxQuery);
    const qb = dataSource.getRepository(OutboxMessage).createQueryBuilder('m').orderBy('m.id', 'DESC');
    if (q.to) qb.where('m.to LIKE :to', { to: `%${likeEscape(q.to)}%` });
    const [items, total] = await qb.skip((q.page - 1) * q.pageSize).take(q.pageSize).getManyAndCount();
    res.json({ items: items.map(presentMessage), total, page: q.page, pageSize: q.pageSize });
  });

  r.get('/outbox/:id', async (req, res) => {
    const m = await dataSource.getRepository(OutboxMessage).findOneBy({ id: idParam.parse(req.params.id) });
    if (!m) throw new NotFound('No such message.');
    res.json({ message: presentMessage(m) });
  });

  return r;
}
