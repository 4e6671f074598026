import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import { ROOT } from '../../server/config';
import { E2E_DB, freePort, testEnv } from './test-env';

declare module 'vitest' {
  export interface ProvidedContext {
    e2eBaseUrl: string;
  }
}

/** Builds the client and serves the whole app (with the demo seed) as a child process for the browser tests. */
export default async function setup(project: TestProject) {
  const build = spawnSync(process.execPath, [path.join(ROOT, 'node_modules/vite/bin/vite.js'), 'build', '--logLevel', 'warn'], { cwd: ROOT, stdio: 'inherit' });
  if (build.status !== 0) throw new Error('vite build failed');

  const [E2E_PORT, E2E_SMTP_PORT] = [await freePort(), await freePort()];
  const env = {
    ...process.env,
    ...testEnv(E2E_DB, { PORT: String(E2E_PORT), FAKE_SMTP_PORT: String(E2E_SMTP_PORT), SEED_DEMO: 'true', JOB_STALE_MS: '5000' }),
    TSX_TSCONFIG_PATH: 'tsconfig.server.json',
  };
  const child: ChildProcess = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    cwd: ROOT,
    env,
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let output = '';
  child.stdout!.on('data', (d) => (output += d));
  child.stderr!.on('data', (d) => (output += d));
  const baseUrl = `http://127.0.0.1:${E2E_PORT}`;
  const until = Date.now() + 90_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`e2e server exited early:\n${output}`);
    try {
      const r = await fetch(`${baseUrl}/api/health`);
      if (r.ok) break;
    } catch {
      /* not up yet */
    }
    if (Date.now() > until) throw new Error(`e2e server did not start:\n${output}`);
    await new Promise((r) => setTimeout(r, 250));
  }
  project.provide('e2eBaseUrl', baseUrl);
  return async () => {
    if (child.exitCode === null) {
      child.kill('SIGTERM');
      await new Promise((r) => child.once('exit', r));
    }
  };
}
