import { Brackets, IsNull, type DataSource } from 'typeorm';
import type { ListUsersQuery, UpdateUserInput } from '../../../shared/schemas/admin';
import { User } from '../../db/entities/user.entity';
import { likeContains } from '../../db/like';
import { BadRequest, Conflict, NotFound } from '../../errors/http-error';

const SORT_COLUMNS = { displayName: 'u.displayName', email: 'u.email', role: 'u.role', createdAt: 'u.createdAt' } as const;

/** The admin's view of accounts: search, sort, page, change roles, disable. */
export class UsersService {
  constructor(private readonly dataSource: DataSource) {}

  async list(q: ListUsersQuery) {
    const qb = this.dataSource.getRepository(User).createQueryBuilder('u');
    if (q.q) {
      const like = likeContains(q.q);
      qb.andWhere(new Brackets((w) => w.where('u.displayName LIKE :like', { like }).orWhere('u.email LIKE :like', { like })));
    }
    if (q.role) qb.andWhere('u.role = :role', { role: q.role });
    qb.orderBy(SORT_COLUMNS[q.sort], q.dir === 'asc' ? 'ASC' : 'DESC').addOrderBy('u.id', 'ASC');
    qb.skip((q.page - 1) * q.pageSize).take(q.pageSize);
    const [items, total] = await qb.getManyAndCount();
    return { items, total, page: q.page, pageSize: q.pageSize };
  }

  /** Changes role or enabled state; the last active admin can be neither demoted nor disabled. */
  async update(actor: User, id: number, input: UpdateUserInput): Promise<User> {
    return this.dataSource.transaction(async (m) => {
      const repo = m.getRepository(User);
      // Lock every active admin row so two admins demoting each other cannot both succeed.
      const admins = await repo.find({ where: { role: 'admin', disabledAt: IsNull() }, lock: { mode: 'pessimistic_write' } });
      const target = await repo.findOne({ where: { id }, lock: { mode: 'pessimistic_write' } });
      if (!target) throw new NotFound('No such user.');
      if (input.disabled && target.id === actor.id) throw new BadRequest('self_disable', 'You cannot disable your own account.');
      const losesAdmin = target.role === 'admin' && !target.disabledAt && ((input.role && input.role !== 'admin') || input.disabled === true);
      if (losesAdmin && admins.length <= 1) {
        throw new Conflict('last_admin', 'You cannot remove the last admin. Make someone else an admin first.');
      }
      const patch: Partial<User> = {};
      if (input.role) patch.role = input.role;
      if (input.disabled !== undefined) patch.disabledAt = input.disabled ? (target.disabledAt ?? new Date()) : null;
      if (input.disabled === true) patch.sessionEpoch = target.sessionEpoch + 1;
      await repo.update({ id }, patch);
      return repo.findOneByOrFail({ id });
    });
  }
}
