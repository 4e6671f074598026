import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync } from 'node:fs';
import path from 'node:path';

/** `npm run bench <name> [args]` runs bench/<name>.bench.ts; with no name it lists them. */
const dir = import.meta.dirname;
const [name, ...rest] = process.argv.slice(2);
const available = readdirSync(dir).filter((f) => f.endsWith('.bench.ts')).map((f) => f.replace('.bench.ts', ''));
if (!name || !existsSync(path.join(dir, `${name}.bench.ts`))) {
  console.log(`usage: npm run bench <name> [args]\navailable: ${available.join(', ')}`);
  process.exit(name ? 1 : 0);
}
const r = spawnSync(process.execPath, ['--import', 'tsx', path.join(dir, `${name}.bench.ts`), ...rest], {
  stdio: 'inherit',
  env: { ...process.env, TSX_TSCONFIG_PATH: 'tsconfig.server.json' },
});
process.exit(r.status ?? 1);
