import { z } from 'zod';
import { descriptionField, nameField } from '@/app/lib/fields';

export const updateWorkspaceSchema = z
  .strictObject({ name: nameField.optional(), description: descriptionField.optional() })
  .refine((v) => v.name !== undefined || v.description !== undefined, { error: 'Change the name or the description.' });
export type UpdateWorkspaceInput = z.infer<typeof updateWorkspaceSchema>;
