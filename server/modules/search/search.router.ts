import { Router } from 'express';
import { searchQuery } from '../../../shared/schemas/search';
import { parsedQuery, validateQuery } from '../../middleware/validate';
import type { SearchService } from './search.service';

/** GET /api/search?q=&page=: cultivar records, tours and caption moments in one grouped answer. */
export function searchRouter(search: SearchService): Router {
  const r = Router();
  r.get('/search', validateQuery(searchQuery), async (_req, res) => {
    const { q, page } = parsedQuery(res, searchQuery);
    // Revalidated every time (Express sends an ETag), so a tour just published shows up at once.
    res.set('Cache-Control', 'no-cache').json(await search.search(q, page));
  });
  return r;
}
