import { mkdir, readdir, rm } from 'node:fs/promises';
import path from 'node:path';
import { In, type DataSource } from 'typeorm';
import { Job as JobEntity } from '../db/entities/job.entity';
import { Tour, type RenditionRecord } from '../db/entities/tour.entity';
import type { Job } from '../db/entities/job.entity';
import { makePoster, makeThumbnailStrip } from '../media/images';
import { chooseRenditions } from '../media/ladder';
import { probeMedia } from '../media/probe';
import type { MediaStorage } from '../media/storage';
import { buildTranscodePlan, runTranscode } from '../media/transcode';
import { PermanentJobError, type JobHandler } from './runner';

/** Seconds between seeking-preview thumbnails: denser for short clips, at most about 200 tiles. */
export function thumbInterval(durationSec: number): number {
  return Math.max(1, Math.ceil(durationSec / 200));
}

/**
 * What the author reads when preparing the video fails: a plain next step, then the converter's own
 * line (the issue asks for ffmpeg's reason), with our storage paths taken out.
 */
export function authorFacingReason(message: string, storageRoot: string): string {
  const lines = message.split('\n').map((l) => l.replaceAll(storageRoot, '…').trim()).filter(Boolean);
  const useful = lines.find((l) => /invalid|error|unsupported|not found|could not|failed|corrupt/i.test(l)) ?? lines[0] ?? 'no reason given';
  return `The video could not be prepared; the file may be damaged or in an unusual format. Export it again as MP4 from your camera or phone and upload it once more. (Converter said: ${useful.slice(0, 400)})`;
}

/**
 * The transcode job: probe the stored upload, encode every rendition in one ffmpeg run (stream copy
 * of the top rung when the source is web-ready and no keyframes are requested), then a poster and
 * thumbnail sheets, all into a fresh folder. Only when everything succeeded does the tour switch to
 * the new folder; the old one is then removed. A failed or interrupted attempt removes its folder.
 */
export function transcodeJob(dataSource: DataSource, storage: MediaStorage): JobHandler {
  const tours = dataSource.getRepository(Tour);

  return {
    async run(ctx) {
      const { job } = ctx;
      const tour = await tours.findOneBy({ id: job.subjectId });
      if (!tour) throw new PermanentJobError('The tour no longer exists.');
      const source = String(job.payload.source ?? tour.sourceFile ?? '');
      if (!source) throw new PermanentJobError('The tour has no uploaded video.');
      const src = storage.resolve(source);
      const outDir = storage.outputDir(tour.id, job.id);
      // A previous attempt of this job may have died half-way: start clean.
      await rm(outDir, { recursive: true, force: true });
      await mkdir(outDir, { recursive: true });
      try {
        const probe = await probeMedia(src, { signal: ctx.signal });
        const durationSec = probe.durationSec ?? 0;
        const keyframeTimesSec = Array.isArray(job.payload.keyframeTimesSec) ? (job.payload.keyframeTimesSec as number[]) : [];
        const plan = buildTranscodePlan(probe, chooseRenditions(probe), { outDir, keyframeTimesSec });
        const result = await runTranscode(plan, {
          signal: ctx.signal,
          onProgress: (p, eta) => void ctx.progress(Math.min(95, p * 0.95), eta ?? null).catch(() => undefined),
        });
        await ctx.progress(96, null);
        const top = result.files[0].path;
        const poster = await makePoster(top, path.join(outDir, 'poster.jpg'), undefined, { signal: ctx.signal });
        const strip = await makeThumbnailStrip(top, outDir, { everySec: thumbInterval(durationSec), width: 160, signal: ctx.signal });
        await ctx.progress(99, 0);

        const renditions: RenditionRecord[] = result.files.map((f) => ({
          height: f.rendition.height,
          width: f.rendition.width,
          file: path.basename(f.path),
          bytes: f.bytes,
          videoBitrate: f.mode === 'encode' ? f.rendition.maxrateKbps : null,
          copied: f.mode === 'copy',
        }));
        const previousDir = tour.mediaDir;
        const fresh = await tours.findOneBy({ id: tour.id });
        if (!fresh || ctx.signal.aborted) throw new PermanentJobError('The tour changed while it was being prepared.');
        const firstTime = fresh.state === 'processing' || fresh.state === 'failed' || fresh.state === 'draft';
        // The demo seed (and later an author's "publish when ready" choice) publishes on completion.
        const nextState = firstTime ? (job.payload.publishWhenReady === true ? 'published' : 'ready') : fresh.state;
        await tours.update(
          { id: tour.id },
          {
            mediaDir: storage.relative(outDir),
            renditions,
            posterFile: path.basename(poster.path),
            thumbStrip: {
              everySec: strip.everySec,
              tileWidth: strip.tileWidth,
              tileHeight: strip.tileHeight,
              columns: strip.columns,
              rows: strip.rows,
              count: strip.entries.length,
              sheets: strip.sheets.map((s) => ({ file: s.file, width: s.width, height: s.height })),
            },
            durationMs: Math.round(durationSec * 1000),
            width: probe.video?.width ?? null,
            height: probe.video?.height ?? null,
            failureReason: null,
            state: nextState,
            ...(nextState === 'published' && !fresh.publishedAt ? { publishedAt: new Date() } : {}),
          },
        );
        if (previousDir && previousDir !== storage.relative(outDir)) await rm(storage.resolve(previousDir), { recursive: true, force: true });
      } catch (err) {
        await rm(outDir, { recursive: true, force: true });
        throw err;
      }
    },

    async onRetry(job: Job, error: string) {
      await tours.update({ id: job.subjectId }, { failureReason: `Attempt ${job.attempts} of ${job.maxAttempts} did not work; Grovewalk tries again in a moment. ${authorFacingReason(error, storage.root)}` });
    },

    async onFinalFailure(job: Job, error: string) {
      const tour = await tours.findOneBy({ id: job.subjectId });
      if (!tour) return;
      await tours.update(
        { id: tour.id },
        { failureReason: authorFacingReason(error, storage.root), state: tour.state === 'processing' ? 'failed' : tour.state },
      );
    },
  };
}

/** Output folders no tour points at (left by a crash between writing and switching): removed at start. */
export async function removeOrphanOutputs(dataSource: DataSource, storage: MediaStorage): Promise<number> {
  let removed = 0;
  const active = await dataSource.getRepository(JobEntity).find({ select: { id: true }, where: { state: In(['queued', 'running']) } });
  const activeJobIds = new Set(active.map((j) => j.id));
  const root = path.join(storage.root, 'renditions');
  let tourDirs: string[] = [];
  try {
    tourDirs = await readdir(root);
  } catch {
    return 0;
  }
  const tours = await dataSource.getRepository(Tour).find({ select: { id: true, mediaDir: true } });
  const current = new Set(tours.map((t) => t.mediaDir).filter(Boolean));
  for (const t of tourDirs) {
    for (const j of await readdir(path.join(root, t)).catch(() => [] as string[])) {
      const rel = path.join('renditions', t, j);
      const jobId = Number(j.replace(/^j/, ''));
      if (!current.has(rel) && !activeJobIds.has(jobId)) {
        await rm(path.join(root, t, j), { recursive: true, force: true });
        removed++;
      }
    }
  }
  return removed;
}
