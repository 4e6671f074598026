/**
 * Media pipeline benchmark. Prints figures and ratios; asserts nothing.
 *
 *   npx tsx --tsconfig tsconfig.server.json bench/media.bench.ts [--quick] [--repeat N] [--keep]
 *
 * --quick uses a 10 s source instead of 60 s; --repeat runs the overhead pair N times and keeps the
 * best of each side (default 1, or 3 with --quick), which damps noise from other work on the machine;
 * --keep leaves the scratch folder for inspection. The source is a generated 1080p30 clip
 * (ffmpeg test pattern and tone, H.264/AAC faststart MP4, i.e. web-ready), never downloaded media.
 */
import { spawn } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { mkdtemp, rm } from 'node:fs/promises';
import { availableParallelism, loadavg, tmpdir } from 'node:os';
import path from 'node:path';
import { chooseRenditions, type Rendition } from '../server/media/ladder';
import { ffmpegPath } from '../server/media/media-tools';
import { isWebReady, probeMedia, type MediaProbe } from '../server/media/probe';
import { buildTranscodePlan, runTranscode, type TranscodePlan, type TranscodePlanOptions } from '../server/media/transcode';
import { generateClip } from '../tests/support/make-clip';

const argv = process.argv.slice(2);
const quick = argv.includes('--quick');
const keep = argv.includes('--keep');
const repeatAt = argv.indexOf('--repeat');
const repeat = repeatAt >= 0 ? Math.max(1, Number(argv[repeatAt + 1]) || 1) : quick ? 3 : 1;
const SECONDS = quick ? 10 : 60;
const FPS = 30;

const fmt = (s: number) => `${s.toFixed(2)} s`;
const speed = (s: number) => `${(SECONDS / s).toFixed(2)}× real time`;

/** Wall time and the CPU time ffmpeg itself used (all threads), so contention from other work shows up as a gap between the two. */
interface Cost {
  wall: number;
  cpu: number;
}
const showCost = (c: Cost) => `${fmt(c.wall)} wall, ${fmt(c.cpu)} CPU`;
const best = (cs: Cost[]): Cost => ({ wall: Math.min(...cs.map((c) => c.wall)), cpu: Math.min(...cs.map((c) => c.cpu)) });
const sum = (cs: Cost[]): Cost => ({ wall: cs.reduce((a, c) => a + c.wall, 0), cpu: cs.reduce((a, c) => a + c.cpu, 0) });

const TICKS_PER_SEC = 100; // USER_HZ on Linux (getconf CLK_TCK)

/**
 * Follows a child's utime + stime from /proc/<pid>/stat every 20 ms; the last sample before the
 * process is reaped is kept, so up to 20 ms of CPU at the very end can be missed (≪ 1 % here).
 * Off Linux it reports 0 and only wall time is meaningful.
 */
function followCpu(pid: number | undefined): () => number {
  let ticks = 0;
  const read = () => {
    try {
      const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
      const rest = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
      ticks = Math.max(ticks, Number(rest[11]) + Number(rest[12]));
    } catch {
      // Gone already: keep the last reading.
    }
  };
  if (pid === undefined) return () => 0;
  read();
  const timer = setInterval(read, 20);
  return () => {
    clearInterval(timer);
    return ticks / TICKS_PER_SEC;
  };
}

async function timed<T>(fn: () => Promise<T>): Promise<[number, T]> {
  const t0 = performance.now();
  const value = await fn();
  return [(performance.now() - t0) / 1000, value];
}

/** Our pipeline: runTranscode through fluent-ffmpeg; Node's own CPU for the run is added to ffmpeg's. */
async function runApp(plan: TranscodePlan): Promise<Cost> {
  let stop: () => number = () => 0;
  const node0 = process.cpuUsage();
  const [wall] = await timed(() => runTranscode(plan, { onStart: (_c, pid) => (stop = followCpu(pid)), onProgress: () => {} }));
  const node = process.cpuUsage(node0);
  return { wall, cpu: stop() + (node.user + node.system) / 1e6 };
}

/** The bare CLI: the same argument list, spawned directly, stderr drained the same way. */
function runCli(plan: TranscodePlan): Promise<Cost> {
  return new Promise((resolve, reject) => {
    const t0 = performance.now();
    const child = spawn(ffmpegPath(), plan.args, { stdio: ['ignore', 'ignore', 'pipe'] });
    const stop = followCpu(child.pid);
    let tail = '';
    child.stderr.on('data', (b: Buffer) => (tail = (tail + b.toString()).slice(-2000)));
    child.on('error', reject);
    child.on('close', (code) => {
      const cpu = stop();
      if (code !== 0) return reject(new Error(`ffmpeg exit ${code}: ${tail}`));
      resolve({ wall: (performance.now() - t0) / 1000, cpu });
    });
  });
}

async function cleanOutputs(plan: TranscodePlan) {
  await Promise.all(plan.outputs.flatMap((o) => [rm(o.path, { force: true }), rm(o.partPath, { force: true })]));
}

function plan(probe: MediaProbe, renditions: Rendition[], dir: string, extra: Partial<TranscodePlanOptions> = {}) {
  return buildTranscodePlan(probe, renditions, { outDir: dir, baseName: 'bench', ...extra });
}

async function main() {
  const dir = await mkdtemp(path.join(tmpdir(), 'grovewalk-bench-'));
  console.log(`Grovewalk media benchmark — ${SECONDS} s 1080p${FPS} source${quick ? ' (--quick)' : ''}, scratch ${dir}`);
  try {
    const src = path.join(dir, 'source.mp4');
    const [genSec] = await timed(() =>
      generateClip(src, { seconds: SECONDS, width: 1920, height: 1080, fps: FPS, audio: true, preset: 'ultrafast' }),
    );
    const [probeSec, probe] = await timed(() => probeMedia(src));
    console.log(`source generated in ${fmt(genSec)}; probe + cut-short check ${fmt(probeSec)}; web-ready: ${isWebReady(probe)}`);
    const ladder = chooseRenditions(probe);
    const byName = (n: string) => ladder.filter((r) => r.name === n);

    // 1. Pipeline overhead: our runTranscode (fluent-ffmpeg) vs the same arguments on the bare CLI.
    console.log('\n1. Pipeline overhead — 720p rendition, identical ffmpeg arguments');
    const p720 = plan(probe, byName('720p'), dir);
    console.log(`   ffmpeg ${p720.args.join(' ')}`);
    const appRuns: Cost[] = [];
    const cliRuns: Cost[] = [];
    for (let i = 0; i < repeat; i++) {
      // Alternate the order so neither side always gets the warmer cache.
      for (const side of i % 2 === 0 ? ['app', 'cli'] : ['cli', 'app']) {
        await cleanOutputs(p720);
        if (side === 'app') appRuns.push(await runApp(p720));
        else cliRuns.push(await runCli(p720));
      }
    }
    const app = best(appRuns);
    const cli = best(cliRuns);
    console.log(`   app (runTranscode): ${appRuns.map(showCost).join(' | ')}  → best ${showCost(app)} (${speed(app.wall)})`);
    console.log(`   bare ffmpeg CLI:    ${cliRuns.map(showCost).join(' | ')}  → best ${showCost(cli)} (${speed(cli.wall)})`);
    const wallRatio = app.wall / cli.wall;
    const cpuRatio = cli.cpu > 0 ? app.cpu / cli.cpu : NaN;
    console.log(`   ratio app / CLI: wall ${wallRatio.toFixed(3)}, CPU ${cpuRatio.toFixed(3)}  (target ≤ 1.05: wall ${wallRatio <= 1.05 ? 'met' : 'not met'}, CPU ${cpuRatio <= 1.05 ? 'met' : 'not met'})`);

    // 2. Stream copy vs full re-encode of the same web-ready source at its own size.
    console.log('\n2. Stream copy vs full re-encode — 1080p top rendition of the web-ready source');
    const pCopy = plan(probe, byName('1080p'), dir);
    const pEncode = plan(probe, byName('1080p'), dir, { allowCopy: false, baseName: 'bench-enc' });
    console.log(`   copy plan: ${pCopy.outputs[0].mode} (${pCopy.copyDecision}); encode plan: ${pEncode.outputs[0].mode}`);
    const copy = await runApp(pCopy);
    const enc = await runApp(pEncode);
    const speedUp = enc.wall / copy.wall;
    console.log(`   stream copy: ${showCost(copy)}   re-encode: ${showCost(enc)} (${speed(enc.wall)})`);
    console.log(`   speed-up copy vs re-encode: wall ${speedUp.toFixed(1)}×, CPU ${(enc.cpu / Math.max(copy.cpu, 0.01)).toFixed(1)}×  (target ≥ 20×: ${speedUp >= 20 ? 'met' : 'not met'})`);

    // 3. All rungs in one run (decode once, split) vs one run per rung, measured back to back.
    console.log('\n3. Multi-rendition — one run vs separate runs per rendition');
    const pAll = plan(probe, ladder, dir, { baseName: 'bench-all' });
    const singles = ladder.map((r) => plan(probe, [r], dir, { baseName: 'bench-sep' }));
    console.log(`   rungs: ${pAll.outputs.map((o) => `${o.rendition.name} (${o.mode})`).join(', ')}`);
    const oneRun = await runApp(pAll);
    const separate: Cost[] = [];
    for (const p of singles) separate.push(await runApp(p));
    const sepTotal = sum(separate);
    console.log(`   one run: ${showCost(oneRun)}`);
    console.log(`   separate runs: ${singles.map((p, i) => `${p.outputs[0].rendition.name} ${fmt(separate[i].wall)}`).join(', ')} = ${showCost(sepTotal)}`);
    console.log(`   ratio one run / separate: wall ${(oneRun.wall / sepTotal.wall).toFixed(3)}, CPU ${(oneRun.cpu / sepTotal.cpu).toFixed(3)}`);
    const load = loadavg()[0];
    console.log(`\n1-minute load average at the end: ${load.toFixed(2)} on ${availableParallelism()} cores${load > availableParallelism() ? ' — the machine was busy: trust the CPU ratios more than the wall ones' : ''}`);
  } finally {
    if (keep) console.log(`\nkept ${dir}`);
    else await rm(dir, { recursive: true, force: true });
  }
}

main().catch((err: unknown) => {
  console.error(err);
  process.exitCode = 1;
});
