import 'reflect-metadata';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import type { DataSource } from 'typeorm';
import { createApp, type AppHandle } from '../../server/app';
import type { Config } from '../../server/config';
import { createDataSource } from '../../server/db/data-source';
import { startFakeSmtp } from '../../server/mail/fake-smtp';
import { createMailer, type Mailer } from '../../server/mail/mailer';
import { INT_DB, testConfig } from './test-env';

/** A small cookie-keeping HTTP client that also carries the CSRF token, like the browser client. */
export class Agent {
  private cookies = new Map<string, string>();
  private csrf: string | null = null;
  constructor(readonly baseUrl: string) {}

  private cookieHeader() {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
  }

  private keepCookies(res: Response) {
    for (const c of res.headers.getSetCookie()) {
      const [pair] = c.split(';');
      const i = pair.indexOf('=');
      const name = pair.slice(0, i);
      const value = pair.slice(i + 1);
      if (/Expires=Thu, 01 Jan 1970/i.test(c) || value === '') this.cookies.delete(name);
      else this.cookies.set(name, value);
    }
  }

  private csrfPending: Promise<string> | null = null;

  /**
   * Fetches a fresh CSRF token for the current session. Concurrent callers share one request, as
   * the browser client does: parallel fetches would each store a new token in the session and all
   * but the last would be refused.
   */
  refreshCsrf(): Promise<string> {
    this.csrfPending ??= (async () => {
      try {
        const res = await this.raw('GET', '/api/auth/csrf');
        this.csrf = ((await res.json()) as { token: string }).token;
        return this.csrf;
      } finally {
        this.csrfPending = null;
      }
    })();
    return this.csrfPending;
  }

  async raw(method: string, url: string, opts: { body?: unknown; rawBody?: string | Buffer; headers?: Record<string, string>; csrf?: boolean | string } = {}): Promise<Response> {
    const headers: Record<string, string> = { ...(opts.headers ?? {}) };
    let body: string | Buffer | undefined;
    if (opts.rawBody !== undefined) body = opts.rawBody;
    else if (opts.body !== undefined) {
      body = JSON.stringify(opts.body);
      headers['content-type'] ??= 'application/json';
    }
    const unsafe = !['GET', 'HEAD', 'OPTIONS'].includes(method);
    if (unsafe && opts.csrf !== false) {
      if (typeof opts.csrf === 'string') headers['x-csrf-token'] = opts.csrf;
      else headers['x-csrf-token'] = this.csrf ?? (await this.refreshCsrf());
    }
    // After the token fetch, which may have started the session cookie.
    if (this.cookies.size) headers.cookie = this.cookieHeader();
    const res = await fetch(this.baseUrl + url, { method, headers, body: body as BodyInit | undefined, redirect: 'manual' });
    this.keepCookies(res);
    return res;
  }

  /** JSON request; returns status and parsed body (null when empty). */
  async call<T = any>(method: string, url: string, body?: unknown, opts: { csrf?: boolean | string; headers?: Record<string, string> } = {}): Promise<{ status: number; body: T; headers: Headers }> {
    const res = await this.raw(method, url, { body, ...opts });
    const text = await res.text();
    return { status: res.status, body: (text ? JSON.parse(text) : null) as T, headers: res.headers };
  }

  /** Multipart upload of a file from disk, as the browser's upload form sends it. */
  async upload<T = any>(url: string, filePath: string, fields: Record<string, string> = {}, fileName?: string): Promise<{ status: number; body: T }> {
    const { readFile } = await import('node:fs/promises');
    const form = new FormData();
    for (const [k, v] of Object.entries(fields)) form.append(k, v);
    form.append('video', new Blob([await readFile(filePath)]), fileName ?? filePath.split('/').pop()!);
    const headers: Record<string, string> = { 'x-csrf-token': this.csrf ?? (await this.refreshCsrf()) };
    if (this.cookies.size) headers.cookie = this.cookieHeader();
    const res = await fetch(this.baseUrl + url, { method: 'POST', headers, body: form });
    this.keepCookies(res);
    const text = await res.text();
    return { status: res.status, body: (text ? JSON.parse(text) : null) as T };
  }

  get = <T = any>(url: string) => this.call<T>('GET', url);
  post = <T = any>(url: string, body?: unknown) => this.call<T>('POST', url, body ?? {});
  patch = <T = any>(url: string, body?: unknown) => this.call<T>('PATCH', url, body ?? {});
  del = <T = any>(url: string) => this.call<T>('DELETE', url);

  async signIn(email: string, password: string) {
    const r = await this.post('/api/auth/sign-in', { email, password });
    this.csrf = null; // the session was regenerated
    return r;
  }
}

export interface TestServer {
  baseUrl: string;
  config: Config;
  dataSource: DataSource;
  mailer: Mailer;
  agent(): Agent;
  close(): Promise<void>;
}

/** Starts the app in-process on a random loopback port against the integration database. */
export async function startTestServer(extraEnv: Record<string, string> = {}, opts: { smtp?: boolean } = {}): Promise<TestServer> {
  const base = testConfig(INT_DB, extraEnv);
  const dataSource = createDataSource(base);
  await dataSource.initialize();
  // Port 0: the system picks a free port, so parallel runs never collide.
  const smtp = opts.smtp === false ? null : await startFakeSmtp(dataSource, 0);
  const config = smtp ? testConfig(INT_DB, { FAKE_SMTP_PORT: String(smtp.port), ...extraEnv }) : base;
  const mailer = createMailer(config.smtpUrl, config.MAIL_FROM, { ignoreTLS: true });
  const handle: AppHandle = createApp({ config, dataSource, mailer, log: () => undefined });
  const server = http.createServer(handle.app);
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', () => r()));
  const baseUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  return {
    baseUrl,
    config,
    dataSource,
    mailer,
    agent: () => new Agent(baseUrl),
    async close() {
      server.closeAllConnections();
      await new Promise<void>((r) => server.close(() => r()));
      mailer.close();
      await smtp?.close();
      await handle.close();
      await dataSource.destroy();
    },
  };
}

/** Empties every table but the migrations' own, so each test file starts from nothing. */
export async function resetTables(ds: DataSource): Promise<void> {
  const rows: { TABLE_NAME: string }[] = await ds.query(
    `SELECT TABLE_NAME FROM information_schema.TABLES WHERE TABLE_SCHEMA = DATABASE() AND TABLE_NAME <> 'migrations' AND TABLE_TYPE = 'BASE TABLE'`,
  );
  await ds.query('SET FOREIGN_KEY_CHECKS = 0');
  for (const r of rows) await ds.query(`TRUNCATE TABLE \`${r.TABLE_NAME}\``);
  await ds.query('SET FOREIGN_KEY_CHECKS = 1');
}
