import { z } from 'zod';
import { emailField, roleField } from '@/app/lib/fields';

export const createInvitationSchema = z.strictObject({ email: emailField, role: roleField });
export type CreateInvitationInput = z.infer<typeof createInvitationSchema>;
