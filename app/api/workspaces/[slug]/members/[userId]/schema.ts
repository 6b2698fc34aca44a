import { z } from 'zod';
import { roleField } from '@/app/lib/fields';

export const changeRoleSchema = z.strictObject({ role: roleField });
export type ChangeRoleInput = z.infer<typeof changeRoleSchema>;
