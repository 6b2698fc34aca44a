import { z } from 'zod';
import { tokenField } from '@/app/lib/fields';

export const acceptInvitationSchema = z.strictObject({ token: tokenField });
export type AcceptInvitationInput = z.infer<typeof acceptInvitationSchema>;
