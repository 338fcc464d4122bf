// Accounts: sign-up, sign-in and the signed-in user. Shared by the server (validation) and the
// app's forms (the same rules, the same messages).
import { z } from 'zod';

export const authPaths = {
  register: '/api/auth/register',
  login: '/api/auth/login',
  me: '/api/me',
  /** POST, 204: every token of the caller (this one too) stops working. */
  signOutEverywhere: '/api/auth/sign-out-everywhere',
  /** POST ChangePasswordRequest -> AuthResponse with a new token; older tokens stop working. */
  password: '/api/auth/password',
} as const;

/** Trimmed and lower-cased before the format check, so "  Ann@Uni.EDU " is ann@uni.edu. */
export const Email = z
  .string({ message: 'E-mail is required' })
  .trim()
  .toLowerCase()
  .min(1, 'E-mail is required')
  .max(254, 'E-mail is too long')
  .pipe(z.email({ message: 'Enter a valid e-mail address' }));

// bcrypt reads at most 72 bytes; the cap keeps every character of a password significant
// for ASCII passwords.
export const NewPassword = z
  .string({ message: 'Password is required' })
  .min(8, 'Password must be at least 8 characters')
  .max(72, 'Password must be at most 72 characters');

export const DisplayName = z
  .string({ message: 'Name is required' })
  .trim()
  .min(1, 'Name is required')
  .max(80, 'Name must be at most 80 characters');

export const RegisterRequest = z.object({
  email: Email,
  password: NewPassword,
  displayName: DisplayName,
});
export type RegisterRequest = z.infer<typeof RegisterRequest>;

export const LoginRequest = z.object({
  email: Email,
  password: z.string({ message: 'Password is required' }).min(1, 'Password is required').max(200),
});
export type LoginRequest = z.infer<typeof LoginRequest>;

export const ChangePasswordRequest = z.object({
  currentPassword: z.string({ message: 'Current password is required' }).min(1, 'Current password is required').max(200),
  newPassword: NewPassword,
});
export type ChangePasswordRequest = z.infer<typeof ChangePasswordRequest>;

export const User = z.object({
  id: z.string(),
  email: z.string(),
  displayName: z.string(),
});
export type User = z.infer<typeof User>;

/** Answer of register (201) and login (200). Send the token as `Authorization: Bearer <token>`. */
export const AuthResponse = z.object({
  token: z.string(),
  user: User,
});
export type AuthResponse = z.infer<typeof AuthResponse>;

/** GET /api/me answers the User itself. */
export const MeResponse = User;
export type MeResponse = User;

export const HealthResponse = z.object({ ok: z.literal(true) });
export type HealthResponse = z.infer<typeof HealthResponse>;
