import { spawn, execFileSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import net from 'node:net';
import path from 'node:path';
import mysql from 'mysql2/promise';

/** A MariaDB server the app owns: private data folder, loopback only, its own port. */
export interface MariaDbInstance {
  dir: string;
  port: number;
  socket: string;
  pidFile: string;
  logFile: string;
  /** True when this process started it (and so must stop it). */
  startedHere: boolean;
}

/** A one-line failure a person can act on, with the log path. */
export class InfraError extends Error {}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

function readPid(pidFile: string): number | null {
  try {
    const pid = Number(readFileSync(pidFile, 'utf8').trim());
    if (!pid) return null;
    process.kill(pid, 0);
    return pid;
  } catch {
    return null;
  }
}

/** Resolves true when something accepts TCP connections on 127.0.0.1:port. */
export function portInUse(port: number, host = '127.0.0.1'): Promise<boolean> {
  return new Promise((resolve) => {
    const sock = net.connect({ port, host });
    sock.once('connect', () => { sock.destroy(); resolve(true); });
    sock.once('error', () => resolve(false));
  });
}

async function ping(socket: string): Promise<boolean> {
  try {
    execFileSync('mariadb-admin', [`--socket=${socket}`, '-uroot', '--connect-timeout=1', 'ping'], { stdio: 'ignore' });
    return true;
  } catch {
    return false;
  }
}

/**
 * Initialises (first time) and starts a private mariadbd bound to 127.0.0.1, or reuses a running
 * one. With `searchPorts`, a taken port is not an error: the next free one of the following 20 is
 * used (test runs of two checkouts on one machine); `inst.port` says which.
 */
export async function startMariaDb(baseDir: string, port: number, opts: { searchPorts?: boolean } = {}): Promise<MariaDbInstance> {
  const dir = path.resolve(baseDir);
  const dataDir = path.join(dir, 'data');
  const inst: MariaDbInstance = {
    dir,
    port,
    socket: path.join(dir, 'mariadb.sock'),
    pidFile: path.join(dir, 'mariadb.pid'),
    logFile: path.join(dir, 'mariadb.log'),
    startedHere: false,
  };
  mkdirSync(dir, { recursive: true });

  const portFile = path.join(dir, 'port');
  const running = readPid(inst.pidFile);
  if (running && (await ping(inst.socket))) {
    if (existsSync(portFile)) inst.port = Number(readFileSync(portFile, 'utf8').trim()) || port;
    return inst;
  }

  if (!existsSync(path.join(dataDir, 'mysql'))) {
    rmSync(dataDir, { recursive: true, force: true });
    try {
      execFileSync(
        'mariadb-install-db',
        ['--user=root', `--datadir=${dataDir}`, '--auth-root-authentication-method=normal', '--skip-test-db'],
        { stdio: ['ignore', 'ignore', 'pipe'] },
      );
    } catch (err) {
      throw new InfraError(`Could not initialise MariaDB's data folder ${dataDir}: ${(err as Error).message.split('\n')[0]}`);
    }
  }

  while (await portInUse(inst.port)) {
    if (!opts.searchPorts || inst.port >= port + 20) {
      throw new InfraError(`Port ${inst.port} for Grovewalk's MariaDB is taken by another program; set DB_PORT to a free port (log: ${inst.logFile}).`);
    }
    inst.port++;
  }
  writeFileSync(portFile, `${inst.port}\n`);

  const child = spawn(
    'mariadbd',
    [
      '--no-defaults',
      `--datadir=${dataDir}`,
      `--socket=${inst.socket}`,
      `--pid-file=${inst.pidFile}`,
      `--port=${inst.port}`,
      '--bind-address=127.0.0.1',
      '--skip-name-resolve',
      '--user=root',
      `--log-error=${inst.logFile}`,
      '--character-set-server=utf8mb4',
      '--collation-server=utf8mb4_unicode_ci',
      '--innodb-buffer-pool-size=256M',
      '--max-connections=300',
    ],
    { detached: true, stdio: 'ignore' },
  );
  child.unref();
  let exited = false;
  child.once('exit', () => { exited = true; });

  for (let i = 0; i < 200; i++) {
    if (exited) break;
    if (await ping(inst.socket)) {
      inst.startedHere = true;
      return inst;
    }
    await sleep(100);
  }
  throw new InfraError(`MariaDB did not start on 127.0.0.1:${inst.port}; see ${inst.logFile}`);
}

/** Stops a server this process started and waits for a clean shutdown. */
export async function stopMariaDb(inst: MariaDbInstance, force = false): Promise<void> {
  if (!inst.startedHere && !force) return;
  const pid = readPid(inst.pidFile);
  if (!pid) return;
  process.kill(pid, 'SIGTERM');
  for (let i = 0; i < 300; i++) {
    try {
      process.kill(pid, 0);
    } catch {
      return;
    }
    await sleep(50);
  }
}

/** Creates the database and its loopback user (idempotent); `fresh` drops the database first. */
export async function ensureDatabase(
  inst: MariaDbInstance,
  db: { name: string; user: string; password: string },
  fresh = false,
): Promise<void> {
  const conn = await mysql.createConnection({ socketPath: inst.socket, user: 'root', multipleStatements: false });
  try {
    if (fresh) await conn.query(`DROP DATABASE IF EXISTS \`${db.name}\``);
    await conn.query(`CREATE DATABASE IF NOT EXISTS \`${db.name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
    for (const host of ['localhost', '127.0.0.1']) {
      await conn.query(`CREATE USER IF NOT EXISTS ?@? IDENTIFIED BY ?`, [db.user, host, db.password]);
      await conn.query(`ALTER USER ?@? IDENTIFIED BY ?`, [db.user, host, db.password]);
      await conn.query(`GRANT ALL PRIVILEGES ON \`${db.name}\`.* TO ?@?`, [db.user, host]);
    }
  } finally {
    await conn.end();
  }
}
