import { Router } from 'express';
import { z } from 'zod';
import { cultivarInput, listCultivarsQuery, updateCultivarInput } from '../../../shared/schemas/cultivars';
import { requireRole } from '../../middleware/auth';
import { parsedQuery, validateBody, validateQuery } from '../../middleware/validate';
import { presentCultivarDetail, presentCultivarSummary } from './cultivar.presenter';
import type { CultivarService } from './cultivar.service';

const idParam = z.coerce.number().int().min(1);
const idOrSlugParam = z.string().trim().min(1).max(160);

/** /api/cultivars: search and read (everyone), propose (authors), edit and approve (moderators). */
export function cultivarRouter(cultivars: CultivarService): Router {
  const r = Router();

  r.get('/cultivars', validateQuery(listCultivarsQuery), async (req, res) => {
    const page = await cultivars.list(parsedQuery(res, listCultivarsQuery), req.user);
    res.json({ ...page, items: page.items.map(presentCultivarSummary) });
  });

  r.get('/cultivars/:idOrSlug', async (req, res) => {
    const { cultivar, variants } = await cultivars.get(idOrSlugParam.parse(req.params.idOrSlug), req.user);
    res.json({ cultivar: presentCultivarDetail(cultivar, variants) });
  });

  r.post('/cultivars', requireRole('author'), validateBody(cultivarInput), async (req, res) => {
    const created = await cultivars.create(req.user!, req.body);
    res.status(201).json({ cultivar: presentCultivarDetail(created, []) });
  });

  r.patch('/cultivars/:id', requireRole('moderator'), validateBody(updateCultivarInput), async (req, res) => {
    const id = idParam.parse(req.params.id);
    await cultivars.update(id, req.body);
    const { cultivar, variants } = await cultivars.get(String(id), req.user);
    res.json({ cultivar: presentCultivarDetail(cultivar, variants) });
  });

  r.post('/cultivars/:id/approve', requireRole('moderator'), async (req, res) => {
    const id = idParam.parse(req.params.id);
    await cultivars.approve(id);
    const { cultivar, variants } = await cultivars.get(String(id), req.user);
    res.json({ cultivar: presentCultivarDetail(cultivar, variants) });
  });

  return r;
}
