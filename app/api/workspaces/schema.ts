import { z } from 'zod';
import { descriptionField, nameField, slugField } from '@/app/lib/fields';

export const createWorkspaceSchema = z.strictObject({
  name: nameField,
  /** The workspace's address, /workspaces/<slug>. */
  slug: slugField,
  description: descriptionField.optional(),
});
export type CreateWorkspaceInput = z.infer<typeof createWorkspaceSchema>;
