import type { DataSource } from 'typeorm';
import type { OutboxQuery } from '../../../shared/schemas/admin';
import { OutboxMessage } from '../../db/entities/outbox-message.entity';
import { likeContains } from '../../db/like';
import { NotFound } from '../../errors/http-error';

/** The local mail catcher's messages, newest first, for admins checking what the site sent. */
export class OutboxService {
  constructor(private readonly dataSource: DataSource) {}

  private repo() {
    return this.dataSource.getRepository(OutboxMessage);
  }

  /** A page of messages, optionally only those whose recipient contains `to`. */
  async list(q: OutboxQuery) {
    const qb = this.repo().createQueryBuilder('m').orderBy('m.id', 'DESC');
    if (q.to) qb.where('m.to LIKE :to', { to: likeContains(q.to) });
    const [items, total] = await qb.skip((q.page - 1) * q.pageSize).take(q.pageSize).getManyAndCount();
    return { items, total, page: q.page, pageSize: q.pageSize };
  }

  async get(id: number): Promise<OutboxMessage> {
    const m = await this.repo().findOneBy({ id });
    if (!m) throw new NotFound('No such message.');
    return m;
  }
}
