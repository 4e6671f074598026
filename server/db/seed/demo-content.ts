import { spawn } from 'node:child_process';
import { mkdir, mkdtemp, rm, writeFile } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import type { DataSource } from 'typeorm';
import { formatAcceptedName } from '../../../shared/names/cultivar-name';
import { normalizeName } from '../../../shared/names/normalize';
import { slugify } from '../../modules/cultivars/slug';
import { TRANSCODE_JOB } from '../../modules/tours/tour.service';
import { JobQueue } from '../../jobs/queue';
import type { MediaStorage } from '../../media/storage';
import { CaptionTrack } from '../entities/caption-track.entity';
import { CueRow } from '../entities/cue.entity';
import { Cultivar } from '../entities/cultivar.entity';
import { CultivarVariant } from '../entities/cultivar-variant.entity';
import { Stop } from '../entities/stop.entity';
import { Tour } from '../entities/tour.entity';
import { User } from '../entities/user.entity';
import { DEMO_CULTIVARS, DEMO_TOURS, type DemoTour } from './demo-cultivars';

const INTRO_SEC = 2;

function ffmpeg(args: string[]): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn('ffmpeg', ['-hide_banner', '-nostdin', '-v', 'error', '-y', ...args], { stdio: ['ignore', 'ignore', 'pipe'] });
    let err = '';
    child.stderr.on('data', (d) => (err += d));
    child.on('error', reject);
    child.on('close', (code) => (code === 0 ? resolve() : reject(new Error(`ffmpeg failed: ${err.slice(-500)}`))));
  });
}

/**
 * Draws a demo walk with ffmpeg's test sources: a title card, then one numbered segment per
 * stop, with a soft tone. Nothing is downloaded; text goes through files so no escaping is needed.
 */
async function renderDemoClip(tour: DemoTour, out: string): Promise<void> {
  const dir = await mkdtemp(path.join(os.tmpdir(), 'grovewalk-demo-'));
  try {
    const total = INTRO_SEC + tour.stops.reduce((s, x) => s + x.seconds, 0);
    const filters: string[] = [];
    const titleFile = path.join(dir, 'title.txt');
    await writeFile(titleFile, `${tour.title}\n(fictional demo)`);
    filters.push(`drawtext=textfile=${titleFile}:fontsize=34:fontcolor=white:box=1:boxcolor=0x1f3a2a@0.8:boxborderw=16:x=(w-tw)/2:y=(h-th)/2:enable='lt(t,${INTRO_SEC})'`);
    let t = INTRO_SEC;
    for (const [i, stop] of tour.stops.entries()) {
      const f = path.join(dir, `stop-${i}.txt`);
      // Only the number: the name is what learn mode asks for, and the tree card shows it anyway.
      await writeFile(f, `Stop ${i + 1}`);
      filters.push(`drawtext=textfile=${f}:fontsize=30:fontcolor=white:box=1:boxcolor=0x1f3a2a@0.75:boxborderw=12:x=40:y=h-th-40:enable='between(t,${t},${t + stop.seconds})'`);
      t += stop.seconds;
    }
    await ffmpeg([
      '-f', 'lavfi', '-i', `testsrc2=size=960x540:rate=25:duration=${total}`,
      '-f', 'lavfi', '-i', `sine=frequency=330:sample_rate=48000:duration=${total}`,
      '-vf', filters.join(','),
      '-af', 'volume=0.08',
      '-c:v', 'libx264', '-preset', 'ultrafast', '-pix_fmt', 'yuv420p',
      '-c:a', 'aac', '-b:a', '96k',
      '-movflags', '+faststart',
      out,
    ]);
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}

/**
 * Seeds the demo content once: invented cultivar records, and (when ffmpeg is present) the demo
 * club's walks rendered with ffmpeg, captioned, cut into stops and queued for transcoding with
 * keyframes at the stops, to be published when ready.
 */
export async function seedDemoContent(dataSource: DataSource, storage: MediaStorage, opts: { withVideo?: boolean } = {}): Promise<{ cultivars: number; tours: number }> {
  const result = { cultivars: 0, tours: 0 };
  const cultivarRepo = dataSource.getRepository(Cultivar);
  const byKey = new Map<string, Cultivar>();
  if ((await cultivarRepo.count()) === 0) {
    for (const c of DEMO_CULTIVARS) {
      const acceptedName = formatAcceptedName({ genus: c.genus, species: c.species, group: c.group ?? undefined, epithet: c.epithet });
      const row = await cultivarRepo.save(
        cultivarRepo.create({
          slug: slugify(acceptedName),
          genus: c.genus,
          species: c.species,
          groupName: c.group,
          epithet: c.epithet,
          acceptedName,
          status: 'approved',
          traits: c.traits,
          notesHtml: c.notesHtml,
          pronunciation: c.pronunciation ?? null,
          meaning: c.meaning,
          fictional: true,
        }),
      );
      for (const v of c.variants) await dataSource.getRepository(CultivarVariant).insert({ cultivarId: row.id, text: v, normalized: normalizeName(v) });
      byKey.set(c.key, row);
      result.cultivars++;
    }
  } else {
    for (const c of DEMO_CULTIVARS) {
      const row = await cultivarRepo.findOneBy({ epithet: c.epithet, genus: c.genus });
      if (row) byKey.set(c.key, row);
    }
  }

  if (opts.withVideo === false || (await dataSource.getRepository(Tour).count()) > 0) return result;
  const queue = new JobQueue(dataSource);
  await storage.ensure();
  for (const demo of DEMO_TOURS) {
    const author = await dataSource.getRepository(User).findOneBy({ email: demo.author });
    if (!author) continue;
    if (demo.stops.some((s) => s.cultivar && !byKey.has(s.cultivar))) continue;
    const totalMs = (INTRO_SEC + demo.stops.reduce((s, x) => s + x.seconds, 0)) * 1000;
    await dataSource.transaction(async (m) => {
      const tour = await m.getRepository(Tour).save(
        m.getRepository(Tour).create({
          authorId: author.id,
          title: demo.title,
          descriptionHtml: demo.description,
          garden: demo.garden,
          filmedOn: demo.filmedOn,
          state: 'processing',
          durationMs: totalMs,
        }),
      );
      const dir = storage.uploadsDir(tour.id);
      await mkdir(dir, { recursive: true });
      const file = path.join(dir, 'source-demo.mp4');
      await renderDemoClip(demo, file);
      await m.getRepository(Tour).update({ id: tour.id }, { sourceFile: storage.relative(file), sourceName: 'demo-walk.mp4', width: 960, height: 540, sourceCodecs: 'h264 + aac' });

      const track = await m.getRepository(CaptionTrack).save(m.getRepository(CaptionTrack).create({ tourId: tour.id, lang: 'en', label: 'English', version: 1 }));
      let t = INTRO_SEC * 1000;
      let seq = 0;
      const keyframes: number[] = [];
      for (const stop of demo.stops) {
        const start = t;
        const end = t + stop.seconds * 1000;
        keyframes.push(start / 1000);
        const slot = (end - start) / stop.lines.length;
        for (const [j, line] of stop.lines.entries()) {
          await m.getRepository(CueRow).insert({
            trackId: track.id,
            seq: seq++,
            startMs: Math.round(start + j * slot + 200),
            endMs: Math.round(start + (j + 1) * slot - 200),
            text: line,
            settings: '',
            cueIdent: null,
          });
        }
        const cultivar = stop.cultivar ? byKey.get(stop.cultivar)! : null;
        await m.getRepository(Stop).insert({ tourId: tour.id, startMs: start, endMs: end, title: cultivar ? cultivar.epithet : 'Tree that lost its label', cultivarId: cultivar?.id ?? null });
        t = end;
      }
      await queue.enqueue(
        { kind: TRANSCODE_JOB, subjectType: 'tour', subjectId: tour.id, payload: { source: storage.relative(file), keyframeTimesSec: keyframes, publishWhenReady: true } },
        m,
      );
    });
    result.tours++;
  }
  return result;
}
