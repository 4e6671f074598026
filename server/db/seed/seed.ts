import bcrypt from 'bcryptjs';
import type { DataSource } from 'typeorm';
import { Club } from '../entities/club.entity';
import { User } from '../entities/user.entity';
import { DEMO_CLUB, DEMO_MEMBERS, DEMO_PASSWORD } from './demo-accounts';

/** Seeds the fictional demo club once: does nothing when a club already exists. Returns whether it seeded. */
export async function seedDemo(dataSource: DataSource, opts: { bcryptCost: number }): Promise<boolean> {
  return dataSource.transaction(async (m) => {
    if ((await m.getRepository(Club).count()) > 0) return false;
    await m.getRepository(Club).insert({ ...DEMO_CLUB, fictional: true });
    const passwordHash = await bcrypt.hash(DEMO_PASSWORD, opts.bcryptCost);
    const now = new Date();
    for (const member of DEMO_MEMBERS) {
      await m.getRepository(User).insert({ ...member, passwordHash, emailVerifiedAt: now });
    }
    return true;
  });
}
