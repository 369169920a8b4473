import { z } from 'zod';
import { email, newPassword } from './common.js';
import { LIMITS } from '../limits.js';

/** POST /api/auth/sign-in */
export const signInRequest = z.object({
  /** Account e-mail. */
  email,
  /** Account password (not checked for length here: old passwords still sign in). */
  password: z
    .string({ error: 'Password is required' })
    .min(1, 'Password is required')
    .max(LIMITS.password.max),
});
export type SignInRequest = z.infer<typeof signInRequest>;

/** POST /api/auth/forgot-password: always answers 202, whether or not the account exists. */
export const forgotPasswordRequest = z.object({
  /** Where to send the reset link. */
  email,
});
export type ForgotPasswordRequest = z.infer<typeof forgotPasswordRequest>;

/** POST /api/auth/reset-password */
export const resetPasswordRequest = z.object({
  /** The single-use token from the e-mailed link. */
  token: z.string({ error: 'Reset link is incomplete' }).min(20, 'Reset link is incomplete').max(200),
  /** The new password. */
  password: newPassword,
});
export type ResetPasswordRequest = z.infer<typeof resetPasswordRequest>;

/** POST /api/auth/change-password (signed in). Signs out every other session. */
export const changePasswordRequest = z
  .object({
    /** The password in use now. */
    currentPassword: z
      .string({ error: 'Current password is required' })
      .min(1, 'Current password is required'),
    /** The new password. */
    newPassword,
  })
  .refine((v) => v.currentPassword !== v.newPassword, {
    path: ['newPassword'],
    message: 'Choose a password different from the current one',
  });
export type ChangePasswordRequest = z.infer<typeof changePasswordRequest>;
