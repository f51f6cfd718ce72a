import { z } from 'zod';
import { roleSchema } from './auth';

/** Admin account search: optional text matched against name and e-mail. */
export const accountSearchSchema = z.object({
  q: z.string().trim().max(100, 'Search text must be at most 100 characters').optional(),
  page: z.coerce.number({ invalid_type_error: 'Page must be a number' }).int().min(1, 'Page starts at 1').default(1),
});

export const accountUpdateSchema = z
  .object({
    role: roleSchema.optional(),
    disabled: z.boolean({ invalid_type_error: 'Disabled must be true or false' }).optional(),
  })
  .refine((value) => value.role !== undefined || value.disabled !== undefined, {
    message: 'Give a new role or a disabled state',
  });

export const idParamSchema = z.object({
  id: z.coerce.number({ invalid_type_error: 'The id must be a number' }).int().positive('The id must be a positive number'),
});

export type AccountSearch = z.infer<typeof accountSearchSchema>;
export type AccountUpdate = z.infer<typeof accountUpdateSchema>;
