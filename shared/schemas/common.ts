import { z } from 'zod';

/** Roles in rising order of trust; the order is used for "at least" checks. */
export const ROLES = ['viewer', 'author', 'moderator', 'admin'] as const;
export const roleSchema = z.enum(ROLES);
export type Role = z.infer<typeof roleSchema>;

/** True when `role` carries at least the rights of `min`. */
export function hasRole(role: Role | null | undefined, min: Role): boolean {
  if (!role) return false;
  return ROLES.indexOf(role) >= ROLES.indexOf(min);
}

/** Every API error has this body, so the client can show `message` and per-field hints. */
export const apiErrorSchema = z.object({
  error: z.object({
    code: z.string(),
    message: z.string(),
    fields: z.record(z.string(), z.string()).optional(),
  }),
});
export type ApiErrorBody = z.infer<typeof apiErrorSchema>;

/**
 * A record id as it appears in an address or an API path: 1 to 9 digits, from 1. The server refuses
 * anything else with a 400; the client shows "not found" for it without asking the server.
 */
export const idSchema = z
  .string()
  .regex(/^\d{1,9}$/)
  .transform(Number)
  .pipe(z.number().int().min(1));

/** Paging query shared by list endpoints. */
export const pageQuerySchema = z.object({
  page: z.coerce.number().int().min(1).max(100_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(100).default(20),
});

/** A page of items as every list endpoint returns it. */
export function pageOf<T extends z.ZodTypeAny>(item: T) {
  return z.object({ items: z.array(item), total: z.number().int(), page: z.number().int(), pageSize: z.number().int() });
}
