// Rows and requests the caption, stop and cultivar integration tests share. Everything named here
// (the garden club, its tours and the cultivar epithets) is invented for the tests.
import type { DataSource } from 'typeorm';
import { normalizeName } from '../../shared/names/normalize';
import { Cultivar } from '../../server/db/entities/cultivar.entity';
import { CultivarVariant } from '../../server/db/entities/cultivar-variant.entity';
import { Tour } from '../../server/db/entities/tour.entity';
import type { TourState } from '../../shared/schemas/tours';
import type { Agent } from './http';

/** A tour row without media (captions and stops only need its owner, state and duration). */
export async function makeTourRow(ds: DataSource, authorId: number, patch: Partial<Tour> = {}): Promise<Tour> {
  const repo = ds.getRepository(Tour);
  return repo.save(
    repo.create({
      authorId,
      title: 'Fernhollow Garden Club: spring walk (fictional)',
      descriptionHtml: '',
      garden: 'Fernhollow (fictional garden)',
      state: 'ready' as TourState,
      durationMs: 60_000,
      ...patch,
    }),
  );
}

/** An approved, fictional cultivar record straight into the database, with optional name variants. */
export async function makeCultivarRow(ds: DataSource, epithet: string, variants: string[] = [], patch: Partial<Cultivar> = {}): Promise<Cultivar> {
  const repo = ds.getRepository(Cultivar);
  const slug = `acer-palmatum-${epithet.toLowerCase().replace(/[^a-z0-9]+/g, '-')}`;
  const c = await repo.save(
    repo.create({
      slug,
      genus: 'Acer',
      species: 'palmatum',
      epithet,
      acceptedName: `Acer palmatum '${epithet}'`,
      status: 'approved',
      notesHtml: '',
      fictional: true,
      ...patch,
    }),
  );
  const vrepo = ds.getRepository(CultivarVariant);
  for (const text of variants) {
    await vrepo.save(vrepo.create({ cultivarId: c.id, text, normalized: normalizeName(text) }));
  }
  return c;
}

/** Posts a caption file as the field "file" of a multipart form, as the import dialog sends it. */
export async function postCaptionFile(agent: Agent, url: string, content: string | Uint8Array, fileName = 'captions.vtt') {
  const form = new FormData();
  const bytes = typeof content === 'string' ? new TextEncoder().encode(content) : content;
  form.append('file', new Blob([new Uint8Array(bytes)]), fileName);
  // Let fetch's own encoder build the multipart body and boundary, then send it through the agent.
  const request = new Request('http://multipart.invalid/', { method: 'POST', body: form });
  const body = Buffer.from(await request.arrayBuffer());
  const res = await agent.raw('POST', url, { rawBody: body, headers: { 'content-type': request.headers.get('content-type')! } });
  const text = await res.text();
  return { status: res.status, body: (text ? JSON.parse(text) : null) as any, headers: res.headers };
}
