import { z } from 'zod';
import { publicUserSchema, type PublicUser, type UpdateAccountInput } from '@shared/schemas/auth';
import { api } from '@/lib/api';

const userResponse = z.object({ user: publicUserSchema });

/** The garden settings a signed-in reader keeps in their account. */
export type AccountPrefsInput = Pick<UpdateAccountInput, 'unitSystem' | 'hardinessZone'>;

/** Saves units and/or zone in the account; the answer is the updated user. */
export function saveAccountPrefs(input: AccountPrefsInput): Promise<PublicUser> {
  return api.patch('/api/account', input, { schema: userResponse }).then((r) => r.user);
}
