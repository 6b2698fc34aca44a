import { z } from 'zod';
import { descriptionField, nameField } from '@/app/lib/fields';

export const createProjectSchema = z.strictObject({
  name: nameField,
  description: descriptionField.optional(),
});
export type CreateProjectInput = z.infer<typeof createProjectSchema>;

export const updateProjectSchema = z
  .strictObject({ name: nameField.optional(), description: descriptionField.optional() })
  .refine((v) => v.name !== undefined || v.description !== undefined, { error: 'Change the name or the description.' });
export type UpdateProjectInput = z.infer<typeof updateProjectSchema>;
