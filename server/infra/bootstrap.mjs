#!/usr/bin/env node
// Entry point of `npm start`, `npm test`, `npm run dev` and `npm run worker`.
// Plain Node.js with no dependencies, because its first job is to install them.
import { spawn, spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..', '..');
const mode = process.argv[2] ?? 'start';
const rest = process.argv.slice(3);

function fail(msg) {
  console.error(`grovewalk: ${msg}`);
  process.exit(1);
}

function has(cmd) {
  return spawnSync('sh', ['-c', `command -v ${cmd}`], { stdio: 'ignore' }).status === 0;
}

function run(cmd, args, opts = {}) {
  const r = spawnSync(cmd, args, { stdio: 'inherit', cwd: ROOT, ...opts });
  if (r.status !== 0) fail(`${cmd} ${args.join(' ')} failed (exit ${r.status ?? r.signal}).`);
}

/** npm dependencies: install when node_modules is missing or older than package-lock.json. */
function ensureNodeModules() {
  const lock = path.join(ROOT, 'package-lock.json');
  const stamp = path.join(ROOT, 'node_modules', '.grovewalk-lock-hash');
  const want = createHash('sha256').update(readFileSync(lock)).digest('hex');
  const have = existsSync(stamp) ? readFileSync(stamp, 'utf8').trim() : '';
  if (have === want) return;
  console.log('grovewalk: installing npm dependencies (npm ci)…');
  run('npm', ['ci', '--no-audit', '--no-fund']);
  writeFileSync(stamp, want + '\n');
}

/** Debian packages: MariaDB and ffmpeg always; Chromium for the browser tests. */
function ensureDebianPackages(withBrowser) {
  const needs = [
    ['mariadbd', 'mariadb-server'],
    ['mariadb-install-db', 'mariadb-server'],
    ['mariadb-admin', 'mariadb-client'],
    ['ffmpeg', 'ffmpeg'],
    ['ffprobe', 'ffmpeg'],
  ];
  if (withBrowser) needs.push(['chromium', 'chromium']);
  const missing = [...new Set(needs.filter(([cmd]) => !has(cmd)).map(([, pkg]) => pkg))];
  if (missing.length === 0) return;
  if (!has('apt-get')) fail(`missing ${missing.join(', ')} and apt-get is not available: install them with your system's package manager.`);
  if (process.getuid && process.getuid() !== 0) fail(`missing ${missing.join(', ')}: run "sudo apt-get install -y ${missing.join(' ')}" or run this command as root.`);
  console.log(`grovewalk: installing ${missing.join(', ')} with apt-get…`);
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  run('apt-get', ['update', '-qq'], { env });
  run('apt-get', ['install', '-y', '-qq', ...missing], { env });
}

const bin = (pkg, file) => path.join(ROOT, 'node_modules', pkg, file);
// tsx as a loader in the same process (its CLI would add a second process between us and the server).
const TSX = ['--import', 'tsx'];
const TSX_ENV = { TSX_TSCONFIG_PATH: 'tsconfig.server.json' };

/** Runs a child in the foreground, forwards termination signals, and exits with its code. */
function foreground(cmd, args, env = {}) {
  const child = spawn(cmd, args, { stdio: 'inherit', cwd: ROOT, env: { ...process.env, ...env } });
  // Ctrl-C reaches the whole process group; the child handles it, we wait for it to finish.
  process.on('SIGINT', () => {});
  process.on('SIGTERM', () => child.kill('SIGTERM'));
  child.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
}

const major = Number(process.versions.node.split('.')[0]);
if (major < 20) fail(`Node.js 20 or newer is needed (this is ${process.version}).`);

ensureNodeModules();
switch (mode) {
  case 'start':
    ensureDebianPackages(false);
    console.log('grovewalk: building the client…');
    run(process.execPath, [bin('vite', 'bin/vite.js'), 'build', '--logLevel', 'warn']);
    foreground(process.execPath, [...TSX, 'server/index.ts', ...rest], { ...TSX_ENV, NODE_ENV: process.env.NODE_ENV ?? 'production' });
    break;
  case 'test':
    ensureDebianPackages(true);
    foreground(process.execPath, [bin('vitest', 'vitest.mjs'), 'run', ...rest], { NODE_ENV: 'test' });
    break;
  case 'dev':
    ensureDebianPackages(false);
    foreground(process.execPath, [
      bin('concurrently', 'dist/bin/concurrently.js'),
      '--kill-others-on-fail',
      '--names', 'api,web',
      '--prefix-colors', 'green,blue',
      `"${process.execPath}" ${bin('tsx', 'dist/cli.mjs')} watch --tsconfig tsconfig.server.json --clear-screen=false server/index.ts`,
      `"${process.execPath}" ${bin('vite', 'bin/vite.js')}`,
    ], { NODE_ENV: 'development' });
    break;
  case 'worker':
    ensureDebianPackages(false);
    foreground(process.execPath, [...TSX, 'server/jobs/worker.ts', ...rest], TSX_ENV);
    break;
  default:
    fail(`unknown mode "${mode}" (start, test, dev, worker).`);
}
