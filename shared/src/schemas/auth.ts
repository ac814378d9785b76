import { z } from 'zod';
import { maxPasswordLength, minPasswordLength } from '../constants/limits.js';

/** Account roles (product brief "Roles"): a member owns a locker and trips; an admin also manages accounts and the catalogue. */
export const accountRoles = ['member', 'admin'] as const;
export const accountRoleSchema = z.enum(accountRoles);
export type AccountRole = z.infer<typeof accountRoleSchema>;

const emailSchema = z
  .string({ error: 'E-mail is required' })
  .trim()
  .toLowerCase()
  .pipe(z.email({ error: 'Enter a valid e-mail address' }).max(254, { error: 'E-mail is too long' }));

/** Body of `POST /api/auth/sign-up`. */
export const signUpSchema = z.object({
  email: emailSchema,
  password: z
    .string({ error: 'Password is required' })
    .min(minPasswordLength, { error: `Password needs at least ${minPasswordLength} characters` })
    .max(maxPasswordLength, { error: `Password may have at most ${maxPasswordLength} characters` }),
  displayName: z
    .string({ error: 'Name is required' })
    .trim()
    .min(1, { error: 'Name is required' })
    .max(80, { error: 'Name may have at most 80 characters' }),
});
export type SignUpInput = z.infer<typeof signUpSchema>;

/** Body of `POST /api/auth/sign-in`. */
export const signInSchema = z.object({
  email: emailSchema,
  password: z
    .string({ error: 'Password is required' })
    .min(1, { error: 'Password is required' })
    .max(maxPasswordLength),
});
export type SignInInput = z.infer<typeof signInSchema>;

/** An account as the API shows it (never the password hash). */
export const accountSchema = z.object({
  id: z.uuid(),
  email: z.email(),
  displayName: z.string(),
  role: accountRoleSchema,
  disabled: z.boolean(),
  createdAt: z.iso.datetime(),
});
export type Account = z.infer<typeof accountSchema>;

/** Body of `PATCH /api/admin/accounts/:id`: an admin changes a role or disables / enables an account. */
export const accountUpdateSchema = z
  .object({
    role: accountRoleSchema.optional(),
    disabled: z.boolean().optional(),
  })
  .refine((v) => v.role !== undefined || v.disabled !== undefined, {
    error: 'Give a role or a disabled flag',
    path: ['role'],
  });
export type AccountUpdateInput = z.infer<typeof accountUpdateSchema>;
