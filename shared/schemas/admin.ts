import { z } from 'zod';
import { pageOf, pageQuerySchema, roleSchema } from './common';

export const USER_SORTS = ['displayName', 'email', 'role', 'createdAt'] as const;

export const listUsersQuery = pageQuerySchema.extend({
  q: z.string().trim().max(100).optional().default(''),
  role: roleSchema.optional(),
  sort: z.enum(USER_SORTS).default('createdAt'),
  dir: z.enum(['asc', 'desc']).default('desc'),
});
export type ListUsersQuery = z.infer<typeof listUsersQuery>;

export const adminUserSchema = z.object({
  id: z.number().int(),
  displayName: z.string(),
  email: z.string(),
  role: roleSchema,
  emailVerified: z.boolean(),
  disabled: z.boolean(),
  createdAt: z.string(),
});
export type AdminUser = z.infer<typeof adminUserSchema>;
export const adminUserPage = pageOf(adminUserSchema);
export type AdminUserPage = z.infer<typeof adminUserPage>;

export const updateUserInput = z
  .object({ role: roleSchema.optional(), disabled: z.boolean().optional() })
  .refine((v) => v.role !== undefined || v.disabled !== undefined, { message: 'Nothing to change.' });
export type UpdateUserInput = z.infer<typeof updateUserInput>;

export const outboxMessageSchema = z.object({
  id: z.number().int(),
  to: z.string(),
  from: z.string(),
  subject: z.string(),
  text: z.string(),
  html: z.string().nullable(),
  receivedAt: z.string(),
});
export type OutboxMessage = z.infer<typeof outboxMessageSchema>;
export const outboxPage = pageOf(outboxMessageSchema);
export type OutboxPage = z.infer<typeof outboxPage>;
export const outboxQuery = pageQuerySchema.extend({ to: z.string().trim().max(254).optional() });
export type OutboxQuery = z.infer<typeof outboxQuery>;
