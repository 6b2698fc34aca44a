/**
 * Every role limit of a workspace lives in this one table.
 *
 * Site admins: an admin who is not a member of a workspace gets the `observer` access
 * level there — they may read the workspace, its members, projects and invitations
 * (for support and moderation), but they do NOT get editor or owner rights. To change
 * anything in a workspace an admin must be invited like anyone else. An admin who is a
 * member acts with their membership role. Site-wide actions (outbox, audit log) are
 * for admins only.
 */

export const WORKSPACE_ROLES = ['owner', 'editor', 'viewer'] as const;
export type WorkspaceRole = (typeof WORKSPACE_ROLES)[number];

/** A membership role, or `observer` for a site admin who is not a member. */
export type WorkspaceAccess = WorkspaceRole | 'observer';

export type SiteRole = 'admin' | 'member';

export const WORKSPACE_ACTIONS = [
  'workspace.read',
  'workspace.rename',
  'member.list',
  'member.invite',
  'member.change-role',
  'member.remove',
  'invitation.list',
  'invitation.revoke',
  'project.read',
  'project.create',
  'project.rename',
  'project.delete',
  'run.read',
  'run.create',
  'run.edit',
  'run.delete',
] as const;
export type WorkspaceAction = (typeof WORKSPACE_ACTIONS)[number];

export const SITE_ACTIONS = ['outbox.read', 'audit.read'] as const;
export type SiteAction = (typeof SITE_ACTIONS)[number];

const workspaceLimits: Record<WorkspaceAccess, ReadonlySet<WorkspaceAction>> = {
  owner: new Set(WORKSPACE_ACTIONS),
  editor: new Set<WorkspaceAction>([
    'workspace.read',
    'member.list',
    'project.read',
    'project.create',
    'project.rename',
    'project.delete',
    'run.read',
    'run.create',
    'run.edit',
    'run.delete',
  ]),
  viewer: new Set<WorkspaceAction>(['workspace.read', 'member.list', 'project.read', 'run.read']),
  observer: new Set<WorkspaceAction>(['workspace.read', 'member.list', 'project.read', 'invitation.list', 'run.read']),
};

const siteLimits: Record<SiteRole, ReadonlySet<SiteAction>> = {
  admin: new Set(SITE_ACTIONS),
  member: new Set<SiteAction>(),
};

export function can(access: WorkspaceAccess | null | undefined, action: WorkspaceAction): boolean {
  if (!access) return false;
  return workspaceLimits[access].has(action);
}

export function canOnSite(siteRole: SiteRole | null | undefined, action: SiteAction): boolean {
  if (!siteRole) return false;
  return siteLimits[siteRole].has(action);
}

/** The access a user has to a workspace, given their membership (if any) and site role. */
export function accessFor(membershipRole: WorkspaceRole | null | undefined, siteRole: SiteRole): WorkspaceAccess | null {
  if (membershipRole) return membershipRole;
  return siteRole === 'admin' ? 'observer' : null;
}
