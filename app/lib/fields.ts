import { z } from 'zod';
import { WORKSPACE_ROLES } from './permissions';

/**
 * Field rules shared by the request schemas. Limits match the column sizes, so an
 * overlong value is a 400 with a field message rather than a database error.
 */
export const emailField = z
  .string({ error: 'Enter an e-mail address.' })
  .trim()
  .max(254, { error: 'At most 254 characters.' })
  .pipe(z.email({ error: 'Enter a valid e-mail address.' }));

/** bcrypt reads at most 72 bytes, so longer passwords would be silently truncated; refuse them. */
export const newPasswordField = z
  .string({ error: 'Enter a password.' })
  .min(10, { error: 'At least 10 characters.' })
  .max(72, { error: 'At most 72 characters.' })
  .refine((v) => new TextEncoder().encode(v).length <= 72, { error: 'At most 72 bytes.' });

export const existingPasswordField = z
  .string({ error: 'Enter your password.' })
  .min(1, { error: 'Enter your password.' })
  .max(200, { error: 'At most 200 characters.' });

export const displayNameField = z
  .string({ error: 'Enter your name.' })
  .trim()
  .min(1, { error: 'Enter your name.' })
  .max(100, { error: 'At most 100 characters.' });

export const tokenField = z
  .string({ error: 'The link is incomplete.' })
  .min(20, { error: 'The link is incomplete.' })
  .max(128, { error: 'The link is not valid.' })
  .regex(/^[A-Za-z0-9_-]+$/, { error: 'The link is not valid.' });

export const roleField = z.enum(WORKSPACE_ROLES, { error: 'Choose owner, editor or viewer.' });

export const nameField = z
  .string({ error: 'Enter a name.' })
  .trim()
  .min(1, { error: 'Enter a name.' })
  .max(120, { error: 'At most 120 characters.' });

export const descriptionField = z.string({ error: 'Must be text.' }).trim().max(2000, { error: 'At most 2000 characters.' });

/** Lower-case letters, digits and inner hyphens; used in the workspace's address. */
export const slugField = z
  .string({ error: 'Enter an address.' })
  .trim()
  .min(2, { error: 'At least 2 characters.' })
  .max(80, { error: 'At most 80 characters.' })
  .regex(/^[a-z0-9](?:[a-z0-9-]*[a-z0-9])?$/, { error: 'Use lower-case letters, digits and hyphens.' })
  .refine((v) => !RESERVED_SLUGS.has(v), { error: 'That address is reserved.' });

export const RESERVED_SLUGS = new Set(['new', 'api', 'admin']);

/** Positive integer ids taken from the URL path. */
export const idParam = z.coerce.number().int().positive();
