import { z } from 'zod';

export const ROLES = ['admin', 'engineer', 'fabricator', 'sales'] as const;
export const roleSchema = z.enum(ROLES);
export type Role = z.infer<typeof roleSchema>;

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Admin',
  engineer: 'Engineer',
  fabricator: 'Fabricator',
  sales: 'Sales',
};

export const emailSchema = z
  .string({ error: 'Enter an e-mail address' })
  .trim()
  .toLowerCase()
  .pipe(z.email({ error: 'Enter a valid e-mail address' }));

export const signInSchema = z.object({
  email: emailSchema,
  password: z.string({ error: 'Enter your password' }).min(1, { error: 'Enter your password' }),
});
export type SignInInput = z.infer<typeof signInSchema>;

/** The user as the API shows it. */
export const publicUserSchema = z.object({
  id: z.string(),
  email: z.string(),
  name: z.string(),
  role: roleSchema,
});
export type PublicUser = z.infer<typeof publicUserSchema>;
