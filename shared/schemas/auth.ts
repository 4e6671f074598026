import { z } from 'zod';
import { USDA_ZONES } from '../hardiness';
import { roleSchema } from './common';

/** Shortest password we accept (NIST SP 800-63B §3.1.1.2 asks for at least 8; we ask for 10). */
export const PASSWORD_MIN = 10;
/** bcrypt only reads the first 72 bytes, so longer passwords would be silently truncated. */
export const PASSWORD_MAX = 72;

export const emailSchema = z
  .string({ error: 'Enter your e-mail address.' })
  .trim()
  .toLowerCase()
  .min(3, 'Enter your e-mail address.')
  .max(254, 'That e-mail address is too long.')
  .pipe(z.email({ error: 'That does not look like an e-mail address.' }));

export const passwordSchema = z
  .string({ error: 'Enter a password.' })
  .min(PASSWORD_MIN, `Use at least ${PASSWORD_MIN} characters.`)
  .refine((p) => new TextEncoder().encode(p).length <= PASSWORD_MAX, `Use at most ${PASSWORD_MAX} bytes (about ${PASSWORD_MAX} plain letters).`);

export const displayNameSchema = z
  .string({ error: 'Enter a display name.' })
  .trim()
  .min(2, 'Use at least 2 characters.')
  .max(60, 'Use at most 60 characters.')
  .refine((s) => !/[<>]/.test(s), 'Angle brackets are not allowed in a name.');

/** A reader's units and USDA zone (1a–13b, or null to forget it), as an account keeps them. */
const accountPrefsFields = {
  unitSystem: z.enum(['metric', 'imperial']).optional(),
  hardinessZone: z.enum(USDA_ZONES).nullable().optional(),
};

/** A new account; the units and zone chosen as a visitor on this browser come with it. */
export const signUpInput = z.object({ displayName: displayNameSchema, email: emailSchema, password: passwordSchema, ...accountPrefsFields });
export type SignUpInput = z.infer<typeof signUpInput>;

export const signInInput = z.object({
  email: emailSchema,
  password: z.string({ error: 'Enter your password.' }).min(1, 'Enter your password.').max(200),
});
export type SignInInput = z.infer<typeof signInInput>;

export const tokenInput = z.object({ token: z.string().trim().min(20, 'This link is incomplete.').max(200) });
export type TokenInput = z.infer<typeof tokenInput>;

export const emailOnlyInput = z.object({ email: emailSchema });
export type EmailOnlyInput = z.infer<typeof emailOnlyInput>;

export const resetPasswordInput = z.object({ token: tokenInput.shape.token, password: passwordSchema });
export type ResetPasswordInput = z.infer<typeof resetPasswordInput>;

export const changePasswordInput = z
  .object({ currentPassword: z.string().min(1, 'Enter your current password.').max(200), newPassword: passwordSchema })
  .refine((v) => v.currentPassword !== v.newPassword, { path: ['newPassword'], message: 'Choose a password you have not used here just now.' });
export type ChangePasswordInput = z.infer<typeof changePasswordInput>;

export const updateAccountInput = z.object({ displayName: displayNameSchema.optional(), ...accountPrefsFields });
export type UpdateAccountInput = z.infer<typeof updateAccountInput>;

/** The signed-in user as the client sees it: no hashes, tokens or internal flags. */
export const publicUserSchema = z.object({
  id: z.number().int(),
  displayName: z.string(),
  email: z.string(),
  role: roleSchema,
  emailVerified: z.boolean(),
  unitSystem: z.enum(['metric', 'imperial']),
  hardinessZone: z.enum(USDA_ZONES).nullable(),
  createdAt: z.string(),
});
export type PublicUser = z.infer<typeof publicUserSchema>;

export const meResponse = z.object({ user: publicUserSchema.nullable() });
export type MeResponse = z.infer<typeof meResponse>;
