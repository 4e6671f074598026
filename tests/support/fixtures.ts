import bcrypt from 'bcryptjs';
import type { DataSource } from 'typeorm';
import type { Role } from '../../shared/schemas/common';
import { User } from '../../server/db/entities/user.entity';
import type { Agent, TestServer } from './http';

export const TEST_PASSWORD = 'correct-horse-battery';
let counter = 0;

/** Inserts a verified user with the given role straight into the database (invented test person). */
export async function makeUser(ds: DataSource, role: Role, patch: Partial<User> = {}): Promise<User> {
  counter++;
  const repo = ds.getRepository(User);
  const user = repo.create({
    email: `${role}${counter}-${Date.now()}@test.example`,
    displayName: `Test ${role} ${counter}`,
    passwordHash: await bcrypt.hash(TEST_PASSWORD, 4),
    role,
    emailVerifiedAt: new Date(),
    ...patch,
  });
  return repo.save(user);
}

/** A signed-in agent for a fresh user of that role. */
export async function agentAs(server: TestServer, role: Role): Promise<{ agent: Agent; user: User }> {
  const user = await makeUser(server.dataSource, role);
  const agent = server.agent();
  const r = await agent.signIn(user.email, TEST_PASSWORD);
  if (r.status !== 200) throw new Error(`sign-in as ${role} failed: ${r.status} ${JSON.stringify(r.body)}`);
  return { agent, user };
}

/** Waits for a message to `to` in the outbox (read through the admin API) and returns it. */
export async function waitForMail(admin: Agent, to: string, subjectPart: string, timeoutMs = 5000) {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const r = await admin.get(`/api/admin/outbox?to=${encodeURIComponent(to)}`);
    if (r.status !== 200) throw new Error(`outbox: ${r.status}`);
    const hit = r.body.items.find((m: { subject: string }) => m.subject.includes(subjectPart));
    if (hit) return hit as { id: number; to: string; subject: string; text: string; html: string | null };
    await new Promise((res) => setTimeout(res, 100));
  }
  throw new Error(`no mail to ${to} with "${subjectPart}" within ${timeoutMs} ms`);
}

/** The token of the first Grovewalk link in a message. */
export function linkToken(text: string, pathName: '/verify' | '/reset-password'): string {
  const m = text.match(new RegExp(`${pathName.replace('/', '\\/')}\\?token=([A-Za-z0-9_%-]+)`));
  if (!m) throw new Error(`no ${pathName} link in: ${text}`);
  return decodeURIComponent(m[1]);
}
