/**
 * Auth contract: sign-up, sign-in, sign-out, current user. Client-safe (zod only).
 */
import { z } from 'zod';

export const AUTH_PATHS = {
  signup: '/api/auth/signup',
  login: '/api/auth/login',
  logout: '/api/auth/logout',
  me: '/api/auth/me',
} as const;

export const PASSWORD_MIN_LENGTH = 10;

export const userSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  name: z.string(),
  isAdmin: z.boolean(),
});
export type User = z.infer<typeof userSchema>;

const emailField = z
  .string()
  .trim()
  .toLowerCase()
  .pipe(z.email({ message: 'Enter a valid email address.' }));

export const signupRequestSchema = z.object({
  email: emailField,
  password: z
    .string()
    .min(PASSWORD_MIN_LENGTH, { message: `Password must be at least ${PASSWORD_MIN_LENGTH} characters.` })
    .max(200, { message: 'Password must be at most 200 characters.' }),
  name: z.string().trim().min(1, { message: 'Enter your name.' }).max(120),
});
export type SignupRequest = z.infer<typeof signupRequestSchema>;

export const loginRequestSchema = z.object({
  email: emailField,
  password: z.string().min(1, { message: 'Enter your password.' }).max(200),
});
export type LoginRequest = z.infer<typeof loginRequestSchema>;

/** Body of 201 signup, 200 login and 200 me. Logout answers 204 with no body. */
export const userResponseSchema = z.object({ user: userSchema });
export type UserResponse = z.infer<typeof userResponseSchema>;
