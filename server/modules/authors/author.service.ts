import type { DataSource } from 'typeorm';
import { hasRole } from '../../../shared/schemas/common';
import { User } from '../../db/entities/user.entity';
import { NotFound } from '../../errors/http-error';
import type { TourService } from '../tours/tour.service';

/**
 * Public author pages. Someone is shown as an author when they may publish (author role or above)
 * or have published tours; viewers' accounts and disabled accounts are not public pages.
 */
export class AuthorService {
  constructor(
    private readonly dataSource: DataSource,
    private readonly tours: TourService,
  ) {}

  /** Everyone with a published tour (disabled accounts aside), by display name, with how many. */
  async withPublishedTours(): Promise<{ id: number; displayName: string; publishedTours: number }[]> {
    const rows = (await this.dataSource.query(
      `SELECT u.id AS id, u.display_name AS displayName, COUNT(*) AS publishedTours
       FROM tours t JOIN users u ON u.id = t.author_id
       WHERE t.state = 'published' AND u.disabled_at IS NULL
       GROUP BY u.id, u.display_name
       ORDER BY u.display_name, u.id`,
    )) as { id: number | string; displayName: string; publishedTours: number | string }[];
    return rows.map((r) => ({ id: Number(r.id), displayName: r.displayName, publishedTours: Number(r.publishedTours) }));
  }

  /** The author and one page of their published tours (newest first). */
  async page(id: number, page: number, pageSize: number) {
    const user = await this.dataSource.getRepository(User).findOneBy({ id });
    if (!user || user.disabledAt) throw new NotFound('No such author.');
    const tours = await this.tours.list({ author: id, page, pageSize }, undefined);
    if (!hasRole(user.role, 'author') && tours.total === 0) throw new NotFound('No such author.');
    return { user, tours };
  }
}
