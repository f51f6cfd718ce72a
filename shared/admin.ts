import { z } from 'zod';
import { pageSchema } from './common';
import { roleSchema } from './auth';

/** Admin account search: optional text matched against name and e-mail. */
export const accountSearchSchema = z.object({
  q: z.string().trim().max(100, 'Search text must be at most 100 characters').optional(),
  page: pageSchema,
  /** Only accounts with this role. */
  role: z.enum(['archer', 'tech', 'admin'], { errorMap: () => ({ message: 'Role must be archer, tech or admin' }) }).optional(),
});

/** An account as the admin list shows it. */
export const adminAccountSchema = z.object({
  id: z.number().int().positive(),
  name: z.string(),
  email: z.string(),
  role: roleSchema,
  distanceUnit: z.string(),
  lengthUnit: z.string(),
  disabled: z.boolean(),
  createdAt: z.string().optional(),
});

export const accountListResponseSchema = z.object({
  accounts: z.array(adminAccountSchema),
  total: z.number().int(),
  page: z.number().int(),
  pageSize: z.number().int(),
});

export const accountUpdateSchema = z
  .object({
    role: roleSchema.optional(),
    disabled: z.boolean({ invalid_type_error: 'Disabled must be true or false' }).optional(),
  })
  .refine((value) => value.role !== undefined || value.disabled !== undefined, {
    message: 'Give a new role or a disabled state',
  });

export type AccountSearch = z.infer<typeof accountSearchSchema>;
export type AccountUpdate = z.infer<typeof accountUpdateSchema>;
export type AdminAccount = z.infer<typeof adminAccountSchema>;
export type AccountList = z.infer<typeof accountListResponseSchema>;
