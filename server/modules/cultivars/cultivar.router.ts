import { Router } from 'express';
import { z } from 'zod';
import { cultivarIndexQuery, cultivarInput, mergeCultivarInput, updateCultivarInput, variantInput, type MergeCultivarResponse } from '../../../shared/schemas/cultivars';
import type { User } from '../../db/entities/user.entity';
import { requireRole } from '../../middleware/auth';
import { idParam, parsedQuery, validateBody, validateQuery } from '../../middleware/validate';
import { presentCultivarFull, presentCultivarIndexRow } from './cultivar.presenter';
import type { CultivarService } from './cultivar.service';

const idOrSlugParam = z.string().trim().min(1).max(160);

/**
 * /api/cultivars: the index with filters (everyone), a record in full (everyone who may see it),
 * propose (authors), edit, approve, retire, merge and variants (moderators). Photos: see
 * cultivar-photo.router.ts.
 */
export function cultivarRouter(cultivars: CultivarService): Router {
  const r = Router();
  const full = async (idOrSlug: string, viewer: User | undefined) => presentCultivarFull(await cultivars.full(idOrSlug, viewer));

  r.get('/cultivars', validateQuery(cultivarIndexQuery), async (req, res) => {
    const page = await cultivars.list(parsedQuery(res, cultivarIndexQuery), req.user);
    res.json({ ...page, items: page.items.map(presentCultivarIndexRow) });
  });

  r.get('/cultivars/:idOrSlug', async (req, res) => {
    res.json({ cultivar: await full(idOrSlugParam.parse(req.params.idOrSlug), req.user) });
  });

  r.post('/cultivars', requireRole('author'), validateBody(cultivarInput), async (req, res) => {
    const created = await cultivars.create(req.user!, req.body);
    res.status(201).json({ cultivar: await full(String(created.id), req.user) });
  });

  r.patch('/cultivars/:id', requireRole('moderator'), validateBody(updateCultivarInput), async (req, res) => {
    const id = idParam.parse(req.params.id);
    await cultivars.update(id, req.body);
    res.json({ cultivar: await full(String(id), req.user) });
  });

  r.post('/cultivars/:id/approve', requireRole('moderator'), async (req, res) => {
    const id = idParam.parse(req.params.id);
    await cultivars.approve(id);
    res.json({ cultivar: await full(String(id), req.user) });
  });

  r.post('/cultivars/:id/retire', requireRole('moderator'), async (req, res) => {
    const id = idParam.parse(req.params.id);
    await cultivars.retire(id);
    res.json({ cultivar: await full(String(id), req.user) });
  });

  r.post('/cultivars/:id/merge', requireRole('moderator'), validateBody(mergeCultivarInput), async (req, res) => {
    const result = await cultivars.merge(idParam.parse(req.params.id), req.body.intoId);
    res.json({
      cultivar: await full(String(result.survivor.id), req.user),
      merged: { id: result.merged.id, slug: result.merged.slug, status: result.merged.status, mergedIntoId: result.merged.mergedIntoId },
      movedStops: result.movedStops,
      movedVariants: result.movedVariants,
    } satisfies MergeCultivarResponse);
  });

  r.post('/cultivars/:id/variants', requireRole('moderator'), validateBody(variantInput), async (req, res) => {
    const variant = await cultivars.addVariant(idParam.parse(req.params.id), req.body.text);
    res.status(201).json({ variant: { id: variant.id, text: variant.text } });
  });

  r.delete('/cultivars/:id/variants/:variantId', requireRole('moderator'), async (req, res) => {
    await cultivars.removeVariant(idParam.parse(req.params.id), idParam.parse(req.params.variantId));
    res.status(204).end();
  });

  return r;
}
