/**
 * A generated, invented corpus for the search and API benchmarks: cultivar records with made-up
 * epithets (romanised-Japanese-like and English-like, every one fictional and flagged so), authors,
 * published tours and drafts, caption tracks with narration cues, and stops. Seeded, so every run
 * builds the same data. Nothing here describes a real garden or a real cultivar.
 */
import type { DataSource } from 'typeorm';
import { HABITS, BARKS, LEAF_FORMS, HEIGHT_CLASSES, CONTAINER_SUITABILITIES, PLANT_COLOURS, type TraitProfile } from '../shared/traits';
import { USDA_ZONES } from '../shared/hardiness';
import { normalizeName } from '../shared/names/normalize';

/** mulberry32: a small seeded PRNG (public-domain algorithm), enough for benchmark data. */
export function prng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const SYLLABLES = 'ka ki ku ke ko sa shi su se so ta chi tsu te to na ni nu ne no ha hi fu he ho ma mi mu me mo ya yu yo ra ri ru re ro wa ga gi go za ji zu ba bi bo'.split(' ');
const HEADS = 'Brindle Quill Tansy Moss Fern Hollow Lantern Copper Amber Ember Willow Bramble Thistle Heron Wren Pebble Cinder Rill Spire Tallow Larch Sorrel Fennick Dunmere'.split(' ');
const TAILS = 'wick mere gate moor dale field stone brook hythe combe'.split(' ');
const SECONDS = 'Flame Lace Dancer Glow Veil Crown Mist Spark Whisper Ribbon Sentinel Cascade'.split(' ');

/** Narration words, commonest first (drawn with a skewed distribution); a few short words and stopwords on purpose. */
export const CUE_WORDS = (
  'the and here this is a of tree to it in maple leaves with on at look colour garden you see bark now ' +
  'autumn spring summer winter green red orange gold purple lace shade sun container pot buried weeping upright ' +
  'branch twig soil mulch water frost path gate pond corner wall fence border stone moss fern shrub hedge compact ' +
  'dwarf small tall wide slow fast hardy zone wind shelter bright fading early late morning light walk next over ' +
  'there behind planted years bought nursery label wrong notice shape lobes seven five deep cut growth delicate ' +
  'graft trunk canopy flush pink scarlet bronze lime cream variegated mound vase spreading columnar repot roots ' +
  'ao ki no mo lovely gorgeous specimen glow evening drizzle pruned pruning wire candle bud buds flowers seeds samara'
).split(' ');
/** Short words the benchmark searches through the fallback (all present in CUE_WORDS). */
export const SHORT_WORDS = ['ao', 'ki', 'mo', 'no'];

/** A record as generated, for the benchmark's queries. */
export interface BenchRecord {
  id: number;
  epithet: string;
}

function pick<T>(rnd: () => number, list: readonly T[]): T {
  return list[Math.floor(rnd() * list.length)]!;
}

function cap(s: string): string {
  return s.charAt(0).toUpperCase() + s.slice(1);
}

function japaneseLike(rnd: () => number): string {
  const word = () => Array.from({ length: 2 + Math.floor(rnd() * 3) }, () => pick(rnd, SYLLABLES)).join('');
  return rnd() < 0.6 ? cap(word()) : `${cap(word())}-${word()}`;
}

function englishLike(rnd: () => number): string {
  const head = `${pick(rnd, HEADS)}${pick(rnd, TAILS)}`;
  return rnd() < 0.7 ? `${head} ${pick(rnd, SECONDS)}` : head;
}

function traits(rnd: () => number): TraitProfile {
  const colours = () => [pick(rnd, PLANT_COLOURS).id];
  const lo = Math.floor(rnd() * 10) + 6;
  return {
    leafForm: pick(rnd, LEAF_FORMS),
    habit: [pick(rnd, HABITS)],
    bark: [pick(rnd, BARKS)],
    colours: { spring: colours(), summer: colours(), autumn: colours() },
    heightClass: pick(rnd, HEIGHT_CLASSES),
    containerSuitability: pick(rnd, CONTAINER_SUITABILITIES),
    hardiness: { min: USDA_ZONES[lo]!, max: USDA_ZONES[lo + 2 + Math.floor(rnd() * 4)]! },
  };
}

/** One slip in the longest word: the kind of misspelling a viewer types. */
export function misspell(rnd: () => number, name: string): string {
  const words = name.split(/([\s-])/);
  let longest = 0;
  words.forEach((w, i) => {
    if (w.length > words[longest]!.length) longest = i;
  });
  const w = words[longest]!;
  const at = 1 + Math.floor(rnd() * Math.max(1, w.length - 2));
  const kind = Math.floor(rnd() * 3);
  const slipped = kind === 0 ? w.slice(0, at) + w.slice(at + 1) : kind === 1 ? w.slice(0, at) + w[at + 1] + w[at] + w.slice(at + 2) : w.slice(0, at) + w[at] + w.slice(at);
  words[longest] = slipped;
  return words.join('');
}

async function insertRows(ds: DataSource, table: string, columns: string[], rows: unknown[][], chunk = 1000): Promise<number> {
  let firstId = 0;
  for (let i = 0; i < rows.length; i += chunk) {
    const part = rows.slice(i, i + chunk);
    const sql = `INSERT INTO ${table} (${columns.join(', ')}) VALUES ${part.map(() => `(${columns.map(() => '?').join(', ')})`).join(', ')}`;
    const res = (await ds.query(sql, part.flat())) as { insertId?: number };
    if (i === 0) firstId = Number(res.insertId ?? 0);
  }
  return firstId;
}

/** What was generated: counts and the records, for building queries. */
export interface BenchCorpus {
  records: BenchRecord[];
  tourIds: number[];
  cueCount: number;
  publishedCueCount: number;
}

/**
 * Fills a fresh database: `recordCount` approved records (a third with a recorded misspelling),
 * 20 authors, `publishedTours` published tours and `draftTours` drafts, each with one English
 * track; cues are spread so the total is `cueCount`; ten stops per tour. The FULLTEXT index is
 * dropped for the load and built afterwards (MariaDB's advice for large loads).
 */
export async function buildCorpus(
  ds: DataSource,
  opts: { seed?: number; recordCount: number; cueCount: number; publishedTours: number; draftTours: number },
): Promise<BenchCorpus> {
  const rnd = prng(opts.seed ?? 20260601);
  const authorsFirst = await insertRows(
    ds,
    'users',
    ['email', 'display_name', 'password_hash', 'role', 'email_verified_at'],
    Array.from({ length: 20 }, (_, i) => [`bench${i}@bench.example`, `Bench member ${i} (invented)`, 'x', 'author', new Date()]),
  );

  const seen = new Set<string>();
  const epithets: string[] = [];
  while (epithets.length < opts.recordCount) {
    let e = rnd() < 0.5 ? japaneseLike(rnd) : englishLike(rnd);
    if (seen.has(normalizeName(e))) e = `${e} ${cap(pick(rnd, SYLLABLES))}${epithets.length}`;
    if (seen.has(normalizeName(e))) continue;
    seen.add(normalizeName(e));
    epithets.push(e);
  }
  const recFirst = await insertRows(
    ds,
    'cultivars',
    ['slug', 'genus', 'species', 'epithet', 'accepted_name', 'status', 'traits', 'notes_html', 'fictional'],
    epithets.map((e, i) => [`acer-palmatum-bench-${i}`, 'Acer', 'palmatum', e, `Acer palmatum '${e}'`, 'approved', JSON.stringify(traits(rnd)), '', 1]),
  );
  const records = epithets.map((epithet, i) => ({ id: recFirst + i, epithet }));
  const variants = records.filter((_, i) => i % 3 === 0).map((r) => {
    const v = misspell(rnd, r.epithet);
    return [r.id, v, normalizeName(v)];
  });
  await insertRows(ds, 'cultivar_variants', ['cultivar_id', 'text', 'normalized'], variants);

  const tourCount = opts.publishedTours + opts.draftTours;
  const tourRows = Array.from({ length: tourCount }, (_, i) => {
    const published = i < opts.publishedTours;
    const year = 2015 + Math.floor(rnd() * 11);
    const filmed = `${year}-${String(1 + Math.floor(rnd() * 12)).padStart(2, '0')}-${String(1 + Math.floor(rnd() * 28)).padStart(2, '0')}`;
    return [
      authorsFirst + (i % 20),
      `Bench walk ${i} through the ${pick(rnd, CUE_WORDS.slice(20, 80))} garden (invented)`,
      `<p>An invented walk past the ${pick(rnd, CUE_WORDS.slice(20, 80))} and the ${pick(rnd, CUE_WORDS.slice(20, 80))}.</p>`,
      `Bench garden ${i % 37} (invented)`,
      filmed,
      published ? 'published' : 'ready',
      published ? new Date(`${filmed}T12:00:00Z`) : null,
      20 * 60_000,
      `renditions/${i + 1}/j1`,
      JSON.stringify([{ height: 720, width: 1280, file: 'rendition-720p.mp4', bytes: 1000, videoBitrate: null, copied: false }]),
      'poster.jpg',
      JSON.stringify({ everySec: 6, tileWidth: 160, tileHeight: 90, columns: 10, rows: 10, count: 200, sheets: [{ file: 'thumbs-001.jpg', width: 1600, height: 900 }, { file: 'thumbs-002.jpg', width: 1600, height: 900 }] }),
    ];
  });
  const tourFirst = await insertRows(
    ds,
    'tours',
    ['author_id', 'title', 'description_html', 'garden', 'filmed_on', 'state', 'published_at', 'duration_ms', 'media_dir', 'renditions', 'poster_file', 'thumb_strip'],
    tourRows,
  );
  const tourIds = Array.from({ length: tourCount }, (_, i) => tourFirst + i);
  const trackFirst = await insertRows(ds, 'caption_tracks', ['tour_id', 'lang', 'label', 'version'], tourIds.map((id) => [id, 'en', 'English', 1]));

  await insertRows(
    ds,
    'stops',
    ['tour_id', 'start_ms', 'end_ms', 'title', 'cultivar_id'],
    tourIds.flatMap((id) => Array.from({ length: 10 }, (_, k) => [id, k * 110_000, k * 110_000 + 100_000, '', pick(rnd, records).id])),
  );

  await ds.query('ALTER TABLE cues DROP INDEX ft_cues_text');
  const perTour = Math.floor(opts.cueCount / tourCount);
  let extra = opts.cueCount - perTour * tourCount;
  const word = () => CUE_WORDS[Math.floor(CUE_WORDS.length * rnd() ** 2.2)]!;
  const cueRows: unknown[][] = [];
  let publishedCueCount = 0;
  for (let t = 0; t < tourCount; t++) {
    const n = perTour + (extra-- > 0 ? 1 : 0);
    if (t < opts.publishedTours) publishedCueCount += n;
    for (let k = 0; k < n; k++) {
      const words = Array.from({ length: 6 + Math.floor(rnd() * 9) }, word);
      const r = rnd();
      if (r < 0.06) words.splice(Math.floor(rnd() * words.length), 0, pick(rnd, records).epithet);
      else if (r < 0.07) words.splice(Math.floor(rnd() * words.length), 0, misspell(rnd, pick(rnd, records).epithet));
      const text = `${cap(words.join(' '))}.`;
      const start = k * 5000;
      cueRows.push([trackFirst + t, k, start, start + 4000, text, '']);
    }
  }
  await insertRows(ds, 'cues', ['track_id', 'seq', 'start_ms', 'end_ms', 'text', 'settings'], cueRows, 2000);
  await ds.query('ALTER TABLE cues ADD FULLTEXT INDEX ft_cues_text (text)');
  await ds.query('ANALYZE TABLE cues, caption_tracks, tours, stops, cultivars, cultivar_variants');
  return { records, tourIds, cueCount: cueRows.length, publishedCueCount };
}
