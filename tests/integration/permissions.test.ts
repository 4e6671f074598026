import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Role } from '../../shared/schemas/common';
import { resetTables, startTestServer, type Agent, type TestServer } from '../support/http';
import { agentAs, makeUser } from '../support/fixtures';

type Who = 'anonymous' | Role;
const WHO: Who[] = ['anonymous', 'viewer', 'author', 'moderator', 'admin'];

let server: TestServer;
const agents = {} as Record<Who, Agent>;
let targetId = 0;

beforeAll(async () => {
  server = await startTestServer();
  await resetTables(server.dataSource);
  agents.anonymous = server.agent();
  for (const role of ['viewer', 'author', 'moderator', 'admin'] as const) agents[role] = (await agentAs(server, role)).agent;
  // A second admin so role changes in the matrix never hit the last-admin rule.
  await makeUser(server.dataSource, 'admin');
  targetId = (await makeUser(server.dataSource, 'viewer')).id;
});
afterAll(async () => server.close());

// Expected status per caller, route by route: [anonymous, viewer, author, moderator, admin].
const MATRIX: { route: string; method: string; path: () => string; body?: unknown; expect: number[] }[] = [
  { route: 'club', method: 'GET', path: () => '/api/club', expect: [200, 200, 200, 200, 200] },
  { route: 'me', method: 'GET', path: () => '/api/auth/me', expect: [200, 200, 200, 200, 200] },
  { route: 'csrf', method: 'GET', path: () => '/api/auth/csrf', expect: [200, 200, 200, 200, 200] },
  { route: 'account', method: 'PATCH', path: () => '/api/account', body: { unitSystem: 'metric' }, expect: [401, 200, 200, 200, 200] },
  {
    route: 'change password',
    method: 'POST',
    path: () => '/api/auth/change-password',
    body: { currentPassword: 'wrong-on-purpose', newPassword: 'never-applied-123' },
    expect: [401, 400, 400, 400, 400],
  },
  { route: 'admin users', method: 'GET', path: () => '/api/admin/users', expect: [401, 403, 403, 403, 200] },
  { route: 'admin user update', method: 'PATCH', path: () => `/api/admin/users/${targetId}`, body: { role: 'author' }, expect: [401, 403, 403, 403, 200] },
  { route: 'outbox', method: 'GET', path: () => '/api/admin/outbox', expect: [401, 403, 403, 403, 200] },
  { route: 'outbox message', method: 'GET', path: () => '/api/admin/outbox/999999', expect: [401, 403, 403, 403, 404] },
  { route: 'forgot password', method: 'POST', path: () => '/api/auth/forgot-password', body: { email: 'nobody@test.example' }, expect: [202, 202, 202, 202, 202] },
];

describe('permission matrix (server-enforced)', () => {
  for (const row of MATRIX) {
    it(`${row.method} ${row.route}`, async () => {
      const got: number[] = [];
      for (const who of WHO) {
        const r = await agents[who].call(row.method, row.path(), row.body);
        got.push(r.status);
        if (r.status >= 400) expect(r.body.error).toMatchObject({ code: expect.any(String), message: expect.any(String) });
      }
      expect(got).toEqual(row.expect);
    });
  }
});
