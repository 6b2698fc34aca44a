import { z } from 'zod';
import { tagsField, titleField } from './saveRunSchema';

/**
 * The save and edit forms write tags as one comma-separated line; this turns it into the tag
 * list the API takes, with the API's own tag rules (so the form says what the server would).
 */
export const tagsTextField = z.string().transform((text, ctx) => {
  const parsed = tagsField.safeParse(text.split(',').map((t) => t.trim()).filter((t) => t !== ''));
  if (parsed.success) return parsed.data;
  // One message on the line itself (not on an element path the form has no field for).
  const issue = parsed.error.issues[0];
  const which = typeof issue.path[0] === 'number' ? `Tag ${issue.path[0] + 1}: ` : '';
  ctx.addIssue({ code: 'custom', message: `${which}${issue.message}` });
  return z.NEVER;
});

export const runDetailsFormSchema = z.object({
  title: titleField,
  tagsText: tagsTextField,
});

export const saveRunFormSchema = runDetailsFormSchema.extend({
  slug: z.string().min(1, { error: 'Choose a workspace.' }),
  projectId: z.string(),
});
export type SaveRunFormInput = z.input<typeof saveRunFormSchema>;
export type SaveRunFormOutput = z.output<typeof saveRunFormSchema>;
