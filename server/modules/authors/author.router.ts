import { Router } from 'express';
import { pageQuerySchema } from '../../../shared/schemas/common';
import { idParam, parsedQuery, validateQuery } from '../../middleware/validate';
import { presentTour } from '../tours/tour.presenter';
import type { AuthorService } from './author.service';

/**
 * GET /api/authors: everyone with a published tour, by name. GET /api/authors/:id: display name,
 * garden, published tour count and a page of their published tours.
 */
export function authorRouter(authors: AuthorService): Router {
  const r = Router();
  r.get('/authors', async (_req, res) => {
    res.json({ items: await authors.withPublishedTours() });
  });
  r.get('/authors/:id', validateQuery(pageQuerySchema), async (req, res) => {
    const { page, pageSize } = parsedQuery(res, pageQuerySchema);
    const { user, tours } = await authors.page(idParam.parse(req.params.id), page, pageSize);
    res.json({
      author: { id: user.id, displayName: user.displayName, garden: user.garden, publishedTours: tours.total, memberSince: user.createdAt.toISOString() },
      tours: { ...tours, items: tours.items.map((t) => presentTour(t, req.user)) },
    });
  });
  return r;
}
