import type { PublicUser } from '../../../shared/schemas/auth';
import type { AdminUser } from '../../../shared/schemas/admin';
import type { User } from '../../db/entities/user.entity';

/** What a user sees of their own account: never the hash or epoch. */
export function presentMe(u: User): PublicUser {
  return {
    id: u.id,
    displayName: u.displayName,
    email: u.email,
    role: u.role,
    emailVerified: !!u.emailVerifiedAt,
    unitSystem: u.unitSystem,
    hardinessZone: (u.hardinessZone as PublicUser['hardinessZone']) ?? null,
    createdAt: u.createdAt.toISOString(),
  };
}

/** What an admin sees in the users table. */
export function presentAdminUser(u: User): AdminUser {
  return {
    id: u.id,
    displayName: u.displayName,
    email: u.email,
    role: u.role,
    emailVerified: !!u.emailVerifiedAt,
    disabled: !!u.disabledAt,
    createdAt: u.createdAt.toISOString(),
  };
}
