import { z } from 'zod';
import { workspaceResponse } from '../workspaces/workspaces-dto';

// Request and response shapes of the auth routes (contract of issue 3). The web imports the
// inferred types with `import type`, so this file depends on zod and the workspace DTOs only.

const email = z
  .email({ message: 'must be a valid e-mail address' })
  .max(254, { message: 'must be at most 254 characters' });
// 10 characters is the floor the contract sets; 200 caps the work argon2 is asked to do.
const newPassword = z
  .string({ message: 'must be a text' })
  .min(10, { message: 'must be at least 10 characters' })
  .max(200, { message: 'must be at most 200 characters' });
const isoTime = z.iso.datetime({ offset: true });

export const signUpRequest = z
  .object({
    email,
    password: newPassword,
    displayName: z
      .string({ message: 'must be a text' })
      .trim()
      .min(1, { message: 'must not be empty' })
      .max(80, { message: 'must be at most 80 characters' }),
  })
  .strict();
export type SignUpRequest = z.infer<typeof signUpRequest>;

export const signInRequest = z
  .object({
    email,
    password: z
      .string({ message: 'must be a text' })
      .min(1, { message: 'must not be empty' })
      .max(200, { message: 'must be at most 200 characters' }),
  })
  .strict();
export type SignInRequest = z.infer<typeof signInRequest>;

export const forgotPasswordRequest = z.object({ email }).strict();
export type ForgotPasswordRequest = z.infer<typeof forgotPasswordRequest>;

export const resetPasswordRequest = z
  .object({
    token: z
      .string({ message: 'must be a text' })
      .min(1, { message: 'must not be empty' })
      .max(200, { message: 'must be at most 200 characters' }),
    password: newPassword,
  })
  .strict();
export type ResetPasswordRequest = z.infer<typeof resetPasswordRequest>;

export const userResponse = z.object({
  id: z.uuid(),
  email: z.string(),
  displayName: z.string(),
  createdAt: isoTime,
});
export type UserResponse = z.infer<typeof userResponse>;

export const sessionResponse = z.object({
  user: userResponse,
  /** Bearer token for the Authorization header; lives 15 minutes. */
  accessToken: z.string(),
  /** When the access token expires. */
  expiresAt: isoTime,
});
export type SessionResponse = z.infer<typeof sessionResponse>;

export const meResponse = z.object({ user: userResponse, workspaces: z.array(workspaceResponse) });
export type MeResponse = z.infer<typeof meResponse>;
