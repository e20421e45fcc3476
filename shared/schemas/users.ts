import { z } from 'zod';
import { emailSchema, roleSchema } from './auth';

export const PASSWORD_MIN_LENGTH = 10;

const passwordSchema = z
  .string({ error: 'Enter a password' })
  .min(PASSWORD_MIN_LENGTH, { error: `Use at least ${PASSWORD_MIN_LENGTH} characters` })
  .max(200, { error: 'Use at most 200 characters' });

const nameSchema = z
  .string({ error: 'Enter a name' })
  .trim()
  .min(1, { error: 'Enter a name' })
  .max(120, { error: 'Use at most 120 characters' });

export const createUserSchema = z.object({
  email: emailSchema,
  name: nameSchema,
  role: roleSchema,
  password: passwordSchema,
});
export type CreateUserInput = z.infer<typeof createUserSchema>;

export const updateUserSchema = z
  .object({
    name: nameSchema.optional(),
    role: roleSchema.optional(),
    active: z.boolean().optional(),
    password: passwordSchema.optional(),
  })
  .refine((v) => Object.keys(v).length > 0, { error: 'Change at least one thing' });
export type UpdateUserInput = z.infer<typeof updateUserSchema>;

/** A user as the admin's user list shows it. */
export interface ManagedUser {
  id: string;
  email: string;
  name: string;
  role: z.infer<typeof roleSchema>;
  active: boolean;
  createdAt: string;
}
