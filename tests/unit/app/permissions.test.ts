import { describe, expect, it } from 'vitest';
import { accessFor, can, canOnSite, WORKSPACE_ACTIONS, type WorkspaceAccess, type WorkspaceAction } from '@/app/lib/permissions';

// The expected table is the product rule written out by hand (common practice, no source):
// owners do everything; editors manage projects, runs and scans; viewers and admin observers only read.
const expected: Record<WorkspaceAccess, WorkspaceAction[]> = {
  owner: [...WORKSPACE_ACTIONS],
  editor: ['workspace.read', 'member.list', 'project.read', 'project.create', 'project.rename', 'project.delete', 'run.read', 'run.create', 'run.edit', 'run.delete'],
  viewer: ['workspace.read', 'member.list', 'project.read', 'run.read'],
  observer: ['workspace.read', 'member.list', 'project.read', 'invitation.list', 'run.read'],
};

describe('permission table', () => {
  for (const access of Object.keys(expected) as WorkspaceAccess[]) {
    for (const action of WORKSPACE_ACTIONS) {
      const allowed = expected[access].includes(action);
      it(`${access} ${allowed ? 'may' : 'may not'} ${action}`, () => {
        expect(can(access, action)).toBe(allowed);
      });
    }
  }

  it('no access means no action', () => {
    for (const action of WORKSPACE_ACTIONS) expect(can(null, action)).toBe(false);
  });

  it('a membership role wins over the site role; a non-member admin is an observer', () => {
    expect(accessFor('viewer', 'admin')).toBe('viewer');
    expect(accessFor(undefined, 'admin')).toBe('observer');
    expect(accessFor(undefined, 'member')).toBeNull();
    expect(accessFor('editor', 'member')).toBe('editor');
  });

  it('only admins read the outbox and the audit log', () => {
    expect(canOnSite('admin', 'outbox.read')).toBe(true);
    expect(canOnSite('admin', 'audit.read')).toBe(true);
    expect(canOnSite('member', 'outbox.read')).toBe(false);
    expect(canOnSite(null, 'audit.read')).toBe(false);
  });
});
