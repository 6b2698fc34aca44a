import { z } from 'zod';
import { newPasswordField, tokenField } from '@/app/lib/fields';

export const passwordResetConfirmSchema = z.strictObject({
  token: tokenField,
  password: newPasswordField,
});
export type PasswordResetConfirmInput = z.infer<typeof passwordResetConfirmSchema>;
