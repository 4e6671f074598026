import { Router } from 'express';
import { listUsersQuery, outboxQuery, updateUserInput } from '../../../shared/schemas/admin';
import type { OutboxMessage } from '../../db/entities/outbox-message.entity';
import { requireRole } from '../../middleware/auth';
import { idParam, parsedQuery, validateBody, validateQuery } from '../../middleware/validate';
import { presentAdminUser } from '../auth/user.presenter';
import type { OutboxService } from './outbox.service';
import type { UsersService } from './users.service';

function presentMessage(m: OutboxMessage) {
  return { id: m.id, to: m.to, from: m.from, subject: m.subject, text: m.text, html: m.html, receivedAt: m.receivedAt.toISOString() };
}

/** /api/admin: users and the outbox of the local mail catcher. Admins only. */
export function adminRouter(users: UsersService, outbox: OutboxService): Router {
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
    const page = await outbox.list(parsedQuery(res, outboxQuery));
    res.json({ ...page, items: page.items.map(presentMessage) });
  });

  r.get('/outbox/:id', async (req, res) => {
    res.json({ message: presentMessage(await outbox.get(idParam.parse(req.params.id))) });
  });

  return r;
}
