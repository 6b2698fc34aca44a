import { z } from 'zod';
import { emailField } from '@/app/lib/fields';

export const passwordResetRequestSchema = z.strictObject({ email: emailField });
export type PasswordResetRequestInput = z.infer<typeof passwordResetRequestSchema>;

/** The same reply whether or not the account exists, so the endpoint does not reveal who has one. */
export const RESET_REQUEST_REPLY = {
  accepted: true,
  message: 'If an account uses that e-mail, a reset link is on its way. It works once and expires in one hour.',
} as const;
