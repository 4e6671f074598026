import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuthToken } from '../../server/db/entities/auth-token.entity';
import { User } from '../../server/db/entities/user.entity';
import { resetTables, startTestServer, type Agent, type TestServer } from '../support/http';
import { agentAs, linkToken, makeUser, TEST_PASSWORD, waitForMail } from '../support/fixtures';

let server: TestServer;
let admin: Agent;

beforeAll(async () => {
  server = await startTestServer();
  await resetTables(server.dataSource);
  admin = (await agentAs(server, 'admin')).agent;
});
afterAll(async () => server.close());

describe('sign up, verify by e-mail, sign in, sign out', () => {
  it('walks the whole journey through the fake SMTP server', async () => {
    const a = server.agent();
    const email = 'new.member@test.example';
    const up = await a.post('/api/auth/sign-up', { displayName: 'New Member', email: 'New.Member@Test.example', password: 'a-long-enough-pass' });
    expect(up.status).toBe(201);

    // Not signed in yet, and an unverified account cannot sign in.
    expect((await a.get('/api/auth/me')).body.user).toBeNull();
    const early = await a.signIn(email, 'a-long-enough-pass');
    expect(early.status).toBe(403);
    expect(early.body.error.code).toBe('email_unverified');

    const mail = await waitForMail(admin, email, 'Confirm your e-mail');
    expect(mail.text).toContain('New Member');
    const token = linkToken(mail.text, '/verify');

    const verified = await a.post('/api/auth/verify', { token });
    expect(verified.status).toBe(200);
    expect(verified.body.user).toMatchObject({ email, displayName: 'New Member', role: 'viewer', emailVerified: true });
    expect(verified.body.user).not.toHaveProperty('passwordHash');

    // The link works once.
    const again = await server.agent().post('/api/auth/verify', { token });
    expect(again.status).toBe(400);
    expect(again.body.error.code).toBe('token_used');

    // Verifying signs in with a new session, so the CSRF token is fetched again (as the client does).
    await a.refreshCsrf();
    expect((await a.post('/api/auth/sign-out')).status).toBe(204);
    expect((await a.get('/api/auth/me')).body.user).toBeNull();

    const b = server.agent();
    const inOk = await b.signIn(email, 'a-long-enough-pass');
    expect(inOk.status).toBe(200);
    expect((await b.get('/api/auth/me')).body.user.email).toBe(email);

    // Stored hash is bcrypt, never the password.
    const row = await server.dataSource.getRepository(User).findOneByOrFail({ email });
    expect(row.passwordHash).toMatch(/^\$2[aby]\$/);
    expect(row.passwordHash).not.toContain('a-long-enough-pass');
  });

  it('starts a new account with the units and zone chosen as a visitor, and refuses an unknown zone', async () => {
    const a = server.agent();
    const email = 'visiting.member@test.example';
    const up = await a.post('/api/auth/sign-up', { displayName: 'Visiting Member', email, password: 'a-long-enough-pass', unitSystem: 'imperial', hardinessZone: '6b' });
    expect(up.status).toBe(201);
    const token = linkToken((await waitForMail(admin, email, 'Confirm your e-mail')).text, '/verify');
    const verified = await a.post('/api/auth/verify', { token });
    expect(verified.body.user).toMatchObject({ email, unitSystem: 'imperial', hardinessZone: '6b' });

    // USDA zones run 1a to 13b (USDA Plant Hardiness Zone Map, 2023).
    const bad = await server.agent().post('/api/auth/sign-up', { displayName: 'Odd Zone', email: 'odd.zone@test.example', password: 'a-long-enough-pass', hardinessZone: '14a' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields).toHaveProperty('hardinessZone');
    // Without them, the defaults.
    const plain = await server.agent().post('/api/auth/sign-up', { displayName: 'Plain Member', email: 'plain.member@test.example', password: 'a-long-enough-pass' });
    expect(plain.status).toBe(201);
    const [row] = await server.dataSource.query('SELECT unit_system AS u, hardiness_zone AS z FROM users WHERE email = ?', ['plain.member@test.example']);
    expect(row).toEqual({ u: 'metric', z: null });
  });

  it('sets an HttpOnly, SameSite=Lax session cookie', async () => {
    const u = await makeUser(server.dataSource, 'viewer');
    const a = server.agent();
    await a.refreshCsrf();
    const res = await a.raw('POST', '/api/auth/sign-in', { body: { email: u.email, password: TEST_PASSWORD } });
    const cookie = res.headers.getSetCookie().find((c) => c.startsWith('grovewalk.sid='));
    expect(cookie).toBeDefined();
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
  });

  it('answers an unknown e-mail and a wrong password the same way', async () => {
    const u = await makeUser(server.dataSource, 'viewer');
    const wrong = await server.agent().signIn(u.email, 'not-the-password');
    const unknown = await server.agent().signIn('nobody-here@test.example', 'not-the-password');
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
  });

  it('refuses a disabled account', async () => {
    const u = await makeUser(server.dataSource, 'viewer', { disabledAt: new Date() });
    const r = await server.agent().signIn(u.email, TEST_PASSWORD);
    expect(r.status).toBe(403);
    expect(r.body.error.code).toBe('account_disabled');
  });

  it('ends a signed-in session when an admin disables the account', async () => {
    const { agent, user } = await agentAs(server, 'viewer');
    expect((await agent.get('/api/auth/me')).body.user.id).toBe(user.id);
    expect((await admin.patch(`/api/admin/users/${user.id}`, { disabled: true })).status).toBe(200);
    expect((await agent.get('/api/auth/me')).body.user).toBeNull();
  });
});

describe('forgotten password', () => {
  it('resets by e-mail link, once, and ends other sessions', async () => {
    const u = await makeUser(server.dataSource, 'author');
    const other = server.agent();
    expect((await other.signIn(u.email, TEST_PASSWORD)).status).toBe(200);

    const a = server.agent();
    expect((await a.post('/api/auth/forgot-password', { email: u.email })).status).toBe(202);
    const unknown = await a.post('/api/auth/forgot-password', { email: 'ghost@test.example' });
    expect(unknown.status).toBe(202);

    const mail = await waitForMail(admin, u.email, 'Reset your Grovewalk password');
    const token = linkToken(mail.text, '/reset-password');
    const r = await a.post('/api/auth/reset-password', { token, password: 'brand-new-password-1' });
    expect(r.status).toBe(200);

    expect((await server.agent().signIn(u.email, TEST_PASSWORD)).status).toBe(401);
    expect((await server.agent().signIn(u.email, 'brand-new-password-1')).status).toBe(200);
    expect((await other.get('/api/auth/me')).body.user).toBeNull();

    const reuse = await a.post('/api/auth/reset-password', { token, password: 'another-password-22' });
    expect(reuse.status).toBe(400);
    expect(reuse.body.error.code).toBe('token_used');
  });

  it('refuses an expired link', async () => {
    const u = await makeUser(server.dataSource, 'viewer');
    await server.agent().post('/api/auth/forgot-password', { email: u.email });
    const mail = await waitForMail(admin, u.email, 'Reset your Grovewalk password');
    const token = linkToken(mail.text, '/reset-password');
    await server.dataSource.getRepository(AuthToken).update({ userId: u.id }, { expiresAt: new Date(Date.now() - 1000) });
    const r = await server.agent().post('/api/auth/reset-password', { token, password: 'brand-new-password-1' });
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe('token_expired');
  });

  it('refuses a made-up link', async () => {
    const r = await server.agent().post('/api/auth/verify', { token: 'x'.repeat(43) });
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe('token_invalid');
  });
});

describe('account', () => {
  it('changes the password (current one required) and the display name', async () => {
    const { agent, user } = await agentAs(server, 'viewer');
    const bad = await agent.post('/api/auth/change-password', { currentPassword: 'wrong-one', newPassword: 'next-password-123' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.currentPassword).toBeDefined();
    const ok = await agent.post('/api/auth/change-password', { currentPassword: TEST_PASSWORD, newPassword: 'next-password-123' });
    expect(ok.status).toBe(200);
    // This session stays signed in; the new password works.
    expect((await agent.get('/api/auth/me')).body.user.id).toBe(user.id);
    expect((await server.agent().signIn(user.email, 'next-password-123')).status).toBe(200);

    const renamed = await agent.patch('/api/account', { displayName: '  Hazel Brook ', unitSystem: 'imperial' });
    expect(renamed.status).toBe(200);
    expect(renamed.body.user).toMatchObject({ displayName: 'Hazel Brook', unitSystem: 'imperial' });
  });
});

describe('sign-in rate limit', () => {
  it('answers 429 after too many attempts', async () => {
    const limited = await startTestServer({ SIGN_IN_LIMIT: '3' }, { smtp: false });
    try {
      const a = limited.agent();
      const codes: number[] = [];
      for (let i = 0; i < 5; i++) codes.push((await a.signIn('someone@test.example', 'wrong-password')).status);
      expect(codes).toEqual([401, 401, 401, 429, 429]);
      const last = await a.signIn('someone@test.example', 'wrong-password');
      expect(last.body.error.code).toBe('rate_limited');
    } finally {
      await limited.close();
    }
  });
});
