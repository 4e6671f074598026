/**
 * Names benchmark: precision and recall of the cultivar-name matcher on the labelled evaluation
 * set (invented data, tests/fixtures/names-eval), and its speed on 10,000 caption cues against
 * 2,000 records compared with a plain exact-match pass over the same cues.
 *
 * Run: npx tsx --tsconfig tsconfig.server.json bench/names.bench.ts
 * Targets: precision ≥ 0.95, recall ≥ 0.90 at the default threshold; 10,000 × 2,000 in < 1 s.
 */
import { buildNameIndex, DEFAULT_THRESHOLD, findNames, type NameMatch } from '../shared/names/matcher';
import { buildBenchCues, buildBenchRecords, buildEvalLines, type EvalLine } from '../tests/fixtures/names-eval/generate';

interface Score {
  tp: number;
  fp: number;
  fn: number;
  strictTp: number;
  precision: number;
  recall: number;
  strictPrecision: number;
  strictRecall: number;
}

function evaluate(lines: EvalLine[], found: NameMatch[][]): Score & { misses: string[]; falsePositives: string[]; byHow: Map<string, [number, number]> } {
  let tp = 0;
  let fp = 0;
  let fn = 0;
  let strictTp = 0;
  const misses: string[] = [];
  const falsePositives: string[] = [];
  const byHow = new Map<string, [number, number]>();
  lines.forEach((line, i) => {
    const matches = found[i]!;
    const used = new Set<number>();
    for (const exp of line.expected) {
      const k = matches.findIndex((m, j) => !used.has(j) && m.recordId === exp.recordId && m.start < exp.end && exp.start < m.end);
      const tally = byHow.get(exp.how) ?? [0, 0];
      tally[1]++;
      if (k >= 0) {
        used.add(k);
        tp++;
        tally[0]++;
        if (matches[k]!.start === exp.start && matches[k]!.end === exp.end) strictTp++;
      } else {
        fn++;
        misses.push(`${exp.how.padEnd(16)} "${line.text.slice(exp.start, exp.end)}" (${exp.recordId}) in: ${line.text}`);
      }
      byHow.set(exp.how, tally);
    }
    matches.forEach((m, j) => {
      if (used.has(j)) return;
      fp++;
      falsePositives.push(`"${m.matchedText}" → ${m.recordId} (${m.kind} ${m.score}) in: ${line.text}`);
    });
  });
  return {
    tp,
    fp,
    fn,
    strictTp,
    precision: tp / Math.max(1, tp + fp),
    recall: tp / Math.max(1, tp + fn),
    strictPrecision: strictTp / Math.max(1, tp + fp),
    strictRecall: strictTp / Math.max(1, tp + fn),
    misses,
    falsePositives,
    byHow,
  };
}

/** The baseline: the same word windows looked up exactly (lower-case) in a map. */
function exactPass(records: { id: string; acceptedEpithet: string }[], cues: string[]): number {
  const map = new Map<string, string>();
  for (const r of records) map.set(r.acceptedEpithet.toLowerCase().split(/[^\p{L}\p{N}]+/u).filter(Boolean).join(' '), r.id);
  let found = 0;
  const word = /[\p{L}\p{M}\p{N}]+/gu;
  for (const cue of cues) {
    const tokens = Array.from(cue.matchAll(word), (m) => m[0].toLowerCase());
    for (let i = 0; i < tokens.length; i++) {
      let key = '';
      for (let w = 0; w < 4 && i + w < tokens.length; w++) {
        key = w === 0 ? tokens[i]! : `${key} ${tokens[i + w]!}`;
        if (map.has(key)) found++;
      }
    }
  }
  return found;
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

/** Median wall-clock and CPU milliseconds over `runs` runs after one warm-up run. */
function time(fn: () => unknown, runs: number): { wall: number; cpu: number } {
  fn();
  const walls: number[] = [];
  const cpus: number[] = [];
  for (let i = 0; i < runs; i++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    fn();
    walls.push(performance.now() - t0);
    const c = process.cpuUsage(c0);
    cpus.push((c.user + c.system) / 1000);
  }
  return { wall: median(walls), cpu: median(cpus) };
}

const f3 = (x: number) => x.toFixed(3);

const records = buildBenchRecords(2000);
const lines = buildEvalLines();
const t0 = performance.now();
const index = buildNameIndex(records);
const buildMs = performance.now() - t0;

const positives = lines.reduce((n, l) => n + l.expected.length, 0);
console.log(`names benchmark — ${records.length} records (index built in ${buildMs.toFixed(1)} ms)`);
console.log(`evaluation set: ${lines.length} lines, ${positives} labelled names, ${lines.filter((l) => l.expected.length === 0).length} lines with none\n`);

for (const threshold of [0.7, DEFAULT_THRESHOLD, 0.8, 0.85]) {
  const s = evaluate(lines, lines.map((l) => findNames(index, l.text, { threshold })));
  const mark = threshold === DEFAULT_THRESHOLD ? '  ← default' : '';
  console.log(
    `threshold ${threshold.toFixed(2)}: precision ${f3(s.precision)}  recall ${f3(s.recall)}  (tp ${s.tp}, fp ${s.fp}, fn ${s.fn}; exact spans: precision ${f3(s.strictPrecision)}, recall ${f3(s.strictRecall)})${mark}`,
  );
}

const main = evaluate(lines, lines.map((l) => findNames(index, l.text)));
console.log('\nrecall by kind of caption form (default threshold):');
for (const [how, [hit, all]] of [...main.byHow].sort()) console.log(`  ${how.padEnd(17)} ${hit}/${all}  ${f3(hit / all)}`);
if (main.falsePositives.length > 0) {
  console.log('\nfalse positives:');
  for (const fp of main.falsePositives) console.log(`  ${fp}`);
}
if (main.misses.length > 0) {
  console.log('\nmissed:');
  for (const miss of main.misses) console.log(`  ${miss}`);
}

const cues = buildBenchCues(records, 10_000);
let matchCount = 0;
const runs = 7;
const matcher = time(() => {
  // A fresh index each run so the memo of words and phonetic keys starts cold.
  const cold = buildNameIndex(records);
  matchCount = 0;
  for (const cue of cues) matchCount += findNames(cold, cue).length;
}, runs);
let exactCount = 0;
const exact = time(() => {
  exactCount = exactPass(records, cues);
}, runs);

console.log(`\nspeed: ${cues.length} cues × ${records.length} records, median of ${runs} runs (wall clock; CPU time in brackets)`);
console.log(
  `  matcher (index build + findNames): ${matcher.wall.toFixed(1)} ms (${matcher.cpu.toFixed(1)} ms CPU), ${matchCount} names found  (target < 1000 ms)`,
);
console.log(`  plain exact-match pass:           ${exact.wall.toFixed(1)} ms (${exact.cpu.toFixed(1)} ms CPU), ${exactCount} exact hits`);
console.log(`  ratio matcher / exact: ${(matcher.wall / exact.wall).toFixed(1)}× wall clock, ${(matcher.cpu / exact.cpu).toFixed(1)}× CPU`);
console.log(
  `\nresult: precision ${f3(main.precision)} (target ≥ 0.95), recall ${f3(main.recall)} (target ≥ 0.90), time ${matcher.wall.toFixed(0)} ms (target < 1000 ms)`,
);
