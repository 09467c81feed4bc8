import { z } from 'zod';
import { Email, LinkToken, Password, PersonName } from './common';

export const ROLES = ['owner', 'foreman', 'technician'] as const;
export const Role = z.enum(ROLES, { error: 'Choose owner, foreman or technician' });
export type Role = z.infer<typeof Role>;

export const SignInInput = z.object({
  email: Email,
  password: z.string({ error: 'Password is required' }).min(1, { error: 'Password is required' }).max(256),
});
export type SignInInput = z.infer<typeof SignInInput>;

export const SignUpInput = z.object({
  workshopName: z
    .string({ error: 'Workshop name is required' })
    .trim()
    .min(2, { error: 'Workshop name needs at least 2 characters' })
    .max(120, { error: 'Workshop name is too long' }),
  name: PersonName,
  email: Email,
  password: Password,
});
export type SignUpInput = z.infer<typeof SignUpInput>;

export const PasswordResetRequestInput = z.object({ email: Email });
export type PasswordResetRequestInput = z.infer<typeof PasswordResetRequestInput>;

export const PasswordResetConfirmInput = z.object({ token: LinkToken, password: Password });
export type PasswordResetConfirmInput = z.infer<typeof PasswordResetConfirmInput>;

export const TokenParams = z.object({ token: LinkToken });

/** What `GET /api/me` returns, and what sign-in, sign-up and invitation acceptance return. */
export const Me = z.object({
  user: z.object({ id: z.string(), email: z.string(), name: z.string() }),
  workshop: z.object({ id: z.string(), name: z.string() }),
  role: Role,
});
export type Me = z.infer<typeof Me>;
