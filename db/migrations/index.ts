/**
 * Every migration, in order. A new migration is a new timestamped file plus one line here.
 */
import type { QueryInterface } from 'sequelize';
import type { Step } from '../umzug';
import * as createUsers from './2026.12.01T10.00.00.create-users';
import * as createWorkspaces from './2026.12.01T10.01.00.create-workspaces';
import * as createMemberships from './2026.12.01T10.02.00.create-memberships';
import * as createProjects from './2026.12.01T10.03.00.create-projects';
import * as createInvitations from './2026.12.01T10.04.00.create-invitations';
import * as createPasswordResets from './2026.12.01T10.05.00.create-password-resets';
import * as createMailOutbox from './2026.12.01T10.06.00.create-mail-outbox';
import * as createAuditLog from './2026.12.01T10.07.00.create-audit-log';
import * as createSignInAttempts from './2026.12.01T10.08.00.create-sign-in-attempts';
import * as createRuns from './2026.12.02T08.00.00.create-runs';
import * as createScans from './2026.12.02T10.00.00.create-scans';

export const migrations: Step<QueryInterface>[] = [
  { name: '2026.12.01T10.00.00.create-users', ...createUsers },
  { name: '2026.12.01T10.01.00.create-workspaces', ...createWorkspaces },
  { name: '2026.12.01T10.02.00.create-memberships', ...createMemberships },
  { name: '2026.12.01T10.03.00.create-projects', ...createProjects },
  { name: '2026.12.01T10.04.00.create-invitations', ...createInvitations },
  { name: '2026.12.01T10.05.00.create-password-resets', ...createPasswordResets },
  { name: '2026.12.01T10.06.00.create-mail-outbox', ...createMailOutbox },
  { name: '2026.12.01T10.07.00.create-audit-log', ...createAuditLog },
  { name: '2026.12.01T10.08.00.create-sign-in-attempts', ...createSignInAttempts },
  { name: '2026.12.02T08.00.00.create-runs', ...createRuns },
  { name: '2026.12.02T10.00.00.create-scans', ...createScans },
];
