import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { User } from '../../server/db/entities/user.entity';
import { resetTables, startTestServer, type TestServer } from '../support/http';
import { agentAs, makeUser } from '../support/fixtures';

let server: TestServer;

beforeAll(async () => {
  server = await startTestServer();
  await resetTables(server.dataSource);
});
afterAll(async () => server.close());

const countUsers = () => server.dataSource.getRepository(User).count();

describe('bad input gets a clear 4xx in the one error shape, and writes nothing', () => {
  it('malformed JSON', async () => {
    const a = server.agent();
    const before = await countUsers();
    const res = await a.raw('POST', '/api/auth/sign-up', { rawBody: '{"displayName": "x", ', headers: { 'content-type': 'application/json' } });
    expect(res.status).toBe(400);
    expect((await res.json()).error.code).toBe('malformed_json');
    expect(await countUsers()).toBe(before);
  });

  it('missing and wrong fields, with a message per field', async () => {
    const r = await server.agent().post('/api/auth/sign-up', { email: 'not-an-email', password: 'short' });
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe('invalid_input');
    expect(Object.keys(r.body.error.fields).sort()).toEqual(['displayName', 'email', 'password']);
    expect(r.body.error.fields.password).toMatch(/at least 10/);
  });

  it('over-long strings', async () => {
    const r = await server.agent().post('/api/auth/sign-up', { displayName: 'x'.repeat(61), email: `${'a'.repeat(250)}@test.example`, password: 'p'.repeat(200) });
    expect(r.status).toBe(400);
    expect(Object.keys(r.body.error.fields).sort()).toEqual(['displayName', 'email', 'password']);
  });

  it('a duplicate e-mail (case-insensitive)', async () => {
    const u = await makeUser(server.dataSource, 'viewer');
    const before = await countUsers();
    const r = await server.agent().post('/api/auth/sign-up', { displayName: 'Copy Cat', email: u.email.toUpperCase(), password: 'long-enough-password' });
    expect(r.status).toBe(409);
    expect(r.body.error.code).toBe('email_taken');
    expect(await countUsers()).toBe(before);
  });

  it('a missing or wrong CSRF token', async () => {
    const a = server.agent();
    const missing = await a.call('POST', '/api/auth/sign-up', { displayName: 'No Token', email: 'no.token@test.example', password: 'long-enough-password' }, { csrf: false });
    expect(missing.status).toBe(403);
    expect(missing.body.error.code).toBe('csrf_invalid');
    await a.refreshCsrf();
    const wrong = await a.call('POST', '/api/auth/sign-up', { displayName: 'No Token', email: 'no.token@test.example', password: 'long-enough-password' }, { csrf: 'f'.repeat(64) });
    expect(wrong.status).toBe(403);
    expect(await server.dataSource.getRepository(User).countBy({ email: 'no.token@test.example' })).toBe(0);
  });

  it('a viewer calling an admin route', async () => {
    const { agent } = await agentAs(server, 'viewer');
    const r = await agent.get('/api/admin/users');
    expect(r.status).toBe(403);
    expect(r.body).toEqual({ error: { code: 'forbidden', message: expect.any(String) } });
  });

  it('an unknown API route and a bad id', async () => {
    const { agent } = await agentAs(server, 'admin');
    expect((await agent.get('/api/nothing-here')).status).toBe(404);
    const bad = await agent.patch('/api/admin/users/abc', { role: 'author' });
    expect(bad.status).toBe(400);
    const none = await agent.patch('/api/admin/users/99999', { role: 'author' });
    expect(none.status).toBe(404);
    const empty = await agent.patch('/api/admin/users/1', {});
    expect(empty.status).toBe(400);
    const badRole = await agent.patch('/api/admin/users/1', { role: 'gardener' });
    expect(badRole.status).toBe(400);
    expect(badRole.body.error.fields.role).toBeDefined();
  });
});

describe('admin user management', () => {
  it('lists with search, sort and paging', async () => {
    const { agent } = await agentAs(server, 'admin');
    for (const name of ['Birch Keeper', 'Alder Keeper', 'Cedar Keeper']) await makeUser(server.dataSource, 'viewer', { displayName: name });
    const r = await agent.get('/api/admin/users?q=keeper&sort=displayName&dir=asc&pageSize=2&page=1');
    expect(r.status).toBe(200);
    expect(r.body.total).toBe(3);
    expect(r.body.items.map((u: { displayName: string }) => u.displayName)).toEqual(['Alder Keeper', 'Birch Keeper']);
    const p2 = await agent.get('/api/admin/users?q=keeper&sort=displayName&dir=asc&pageSize=2&page=2');
    expect(p2.body.items.map((u: { displayName: string }) => u.displayName)).toEqual(['Cedar Keeper']);
    // LIKE wildcards are taken literally.
    expect((await agent.get('/api/admin/users?q=%25')).body.total).toBe(0);
  });

  it('an admin cannot remove the last admin', async () => {
    await resetTables(server.dataSource);
    const { agent, user } = await agentAs(server, 'admin');
    const demote = await agent.patch(`/api/admin/users/${user.id}`, { role: 'moderator' });
    expect(demote.status).toBe(409);
    expect(demote.body.error.code).toBe('last_admin');
    const disable = await agent.patch(`/api/admin/users/${user.id}`, { disabled: true });
    expect(disable.status).toBe(400);
    expect(disable.body.error.code).toBe('self_disable');

    const second = await makeUser(server.dataSource, 'admin');
    expect((await agent.patch(`/api/admin/users/${second.id}`, { role: 'author' })).status).toBe(200);
    expect((await agent.patch(`/api/admin/users/${user.id}`, { role: 'viewer' })).status).toBe(409);
    const roles = (await server.dataSource.getRepository(User).find()).map((u) => u.role);
    expect(roles.filter((r) => r === 'admin')).toHaveLength(1);
  });

  it('two admins demoting each other at once leave one admin', async () => {
    await resetTables(server.dataSource);
    const a = await agentAs(server, 'admin');
    const b = await agentAs(server, 'admin');
    const [ra, rb] = await Promise.all([
      a.agent.patch(`/api/admin/users/${b.user.id}`, { role: 'viewer' }),
      b.agent.patch(`/api/admin/users/${a.user.id}`, { role: 'viewer' }),
    ]);
    // One wins; the other is refused either as the last admin (409) or, if it arrives after the
    // first commit, because its caller is no longer an admin (403).
    const statuses = [ra.status, rb.status].sort();
    expect(statuses[0]).toBe(200);
    expect([403, 409]).toContain(statuses[1]);
    expect(await server.dataSource.getRepository(User).countBy({ role: 'admin' })).toBe(1);
  });
});
