import type { DataSource } from 'typeorm';
import { Stop } from '../../db/entities/stop.entity';
import type { Tour } from '../../db/entities/tour.entity';

/** Tour date order: when it was filmed, else when it was published. */
export type MomentOrder = 'oldest' | 'newest';

/** A stop of a published tour, with that tour (and its author) loaded. */
export type PublishedMoment = Stop & { tour: Tour };

/**
 * Stops of published tours that show any of these records, in order of tour date (filmed, else
 * published; ties by publication and tour id), each tour's stops by time. The one query behind
 * "where to see it", the record page, the tree finder and side by side. With `page`, only that
 * slice is read and `total` counts them all; without it `total` is the number of rows returned.
 */
export async function publishedMoments(
  dataSource: DataSource,
  cultivarIds: readonly number[],
  opts: { order: MomentOrder; page?: { offset: number; limit: number } },
): Promise<{ moments: PublishedMoment[]; total: number }> {
  if (!cultivarIds.length) return { moments: [], total: 0 };
  const dir = opts.order === 'newest' ? 'DESC' : 'ASC';
  const qb = dataSource
    .getRepository(Stop)
    .createQueryBuilder('s')
    .innerJoinAndSelect('s.tour', 't', "t.state = 'published'")
    .leftJoinAndSelect('t.author', 'a')
    .where('s.cultivarId IN (:...ids)', { ids: cultivarIds })
    .orderBy('COALESCE(t.filmed_on, DATE(t.published_at))', dir)
    .addOrderBy('t.published_at', dir)
    .addOrderBy('t.id', dir)
    .addOrderBy('s.start_ms', 'ASC');
  if (!opts.page) {
    const moments = (await qb.getMany()) as PublishedMoment[];
    return { moments, total: moments.length };
  }
  const [moments, total] = await qb.offset(opts.page.offset).limit(opts.page.limit).getManyAndCount();
  return { moments: moments as PublishedMoment[], total };
}
