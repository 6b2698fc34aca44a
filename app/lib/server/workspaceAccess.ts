import 'server-only';
import { ApiError } from '../errors';
import { accessFor, can, type WorkspaceAccess, type WorkspaceAction } from '../permissions';
import { findMembership, findWorkspaceBySlug } from '../queries/workspaces';

/**
 * Resolves a workspace and the user's access to it. Someone with no access at all gets
 * 404 (the workspace's existence is not revealed); someone with access but without the
 * right for `action` gets 403.
 */
export async function requireWorkspaceAccess({
  slug,
  user,
  action,
}: {
  slug: string;
  user: { id: number; siteRole: 'admin' | 'member' };
  action: WorkspaceAction;
}) {
  const workspace = await findWorkspaceBySlug({ slug });
  if (!workspace) throw new ApiError('not_found:workspace');
  const membership = await findMembership({ workspaceId: workspace.id, userId: user.id });
  const access: WorkspaceAccess | null = accessFor(membership?.role, user.siteRole);
  if (!access) throw new ApiError('not_found:workspace');
  if (!can(access, action)) throw new ApiError('forbidden:workspace');
  return { workspace, access };
}
