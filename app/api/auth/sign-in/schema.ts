import { z } from 'zod';
import { emailField, existingPasswordField } from '@/app/lib/fields';

export const signInSchema = z.strictObject({
  email: emailField,
  password: existingPasswordField,
});
export type SignInInput = z.infer<typeof signInSchema>;
