import { z } from 'zod';
import { displayNameField, emailField, newPasswordField, tokenField } from '@/app/lib/fields';

export const signUpSchema = z.strictObject({
  email: emailField,
  displayName: displayNameField,
  password: newPasswordField,
  /** When signing up from an invitation link, the invitation is accepted in the same step. */
  invitationToken: tokenField.optional(),
});
export type SignUpInput = z.infer<typeof signUpSchema>;
