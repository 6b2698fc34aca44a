import 'server-only';
import { UniqueConstraintError, type Transaction } from 'sequelize';
import { ApiError } from '../errors';
import { accessFor, type SiteRole, type WorkspaceAccess, type WorkspaceRole } from '../permissions';
import { getModels, getSequelize } from '../server/db';

export interface WorkspaceSummary {
  id: number;
  name: string;
  slug: string;
  description: string;
  access: WorkspaceAccess;
  memberCount: number;
  createdAt: string;
}

interface WorkspaceLike {
  id: number;
  name: string;
  slug: string;
  description: string;
  createdAt: Date;
}

function summarise(w: WorkspaceLike, access: WorkspaceAccess, memberCount: number): WorkspaceSummary {
  return {
    id: w.id,
    name: w.name,
    slug: w.slug,
    description: w.description,
    access,
    memberCount,
    createdAt: new Date(w.createdAt).toISOString(),
  };
}

async function memberCounts(workspaceIds: number[]): Promise<Map<number, number>> {
  const { Membership } = getModels();
  if (workspaceIds.length === 0) return new Map();
  const rows = await Membership.findAll({ where: { workspaceId: workspaceIds }, attributes: ['workspaceId'] });
  const counts = new Map<number, number>();
  for (const r of rows) counts.set(r.workspaceId, (counts.get(r.workspaceId) ?? 0) + 1);
  return counts;
}

/** A member sees their workspaces; a site admin sees every workspace (as observer where not a member). */
export async function listWorkspacesForUser({
  userId,
  siteRole,
}: {
  userId: number;
  siteRole: SiteRole;
}): Promise<WorkspaceSummary[]> {
  const { Workspace, Membership } = getModels();
  const memberships = await Membership.findAll({ where: { userId } });
  const roleByWorkspace = new Map<number, WorkspaceRole>(memberships.map((m) => [m.workspaceId, m.role]));
  const workspaces =
    siteRole === 'admin'
      ? await Workspace.findAll({ order: [['name', 'ASC']] })
      : await Workspace.findAll({ where: { id: [...roleByWorkspace.keys()] }, order: [['name', 'ASC']] });
  const counts = await memberCounts(workspaces.map((w) => w.id));
  return workspaces.flatMap((w) => {
    const access = accessFor(roleByWorkspace.get(w.id), siteRole);
    return access ? [summarise(w, access, counts.get(w.id) ?? 0)] : [];
  });
}

export async function findWorkspaceBySlug({ slug }: { slug: string }) {
  const { Workspace } = getModels();
  return Workspace.findOne({ where: { slug } });
}

export async function findMembership({ workspaceId, userId }: { workspaceId: number; userId: number }) {
  const { Membership } = getModels();
  return Membership.findOne({ where: { workspaceId, userId } });
}

/** The creator becomes the first owner, in the same transaction as the workspace. */
export async function createWorkspaceWithOwner({
  name,
  slug,
  description,
  userId,
}: {
  name: string;
  slug: string;
  description: string;
  userId: number;
}) {
  const { Workspace, Membership } = getModels();
  try {
    return await getSequelize().transaction(async (transaction: Transaction) => {
      const workspace = await Workspace.create({ name, slug, description, createdBy: userId }, { transaction });
      await Membership.create({ workspaceId: workspace.id, userId, role: 'owner' }, { transaction });
      return workspace;
    });
  } catch (error) {
    if (error instanceof UniqueConstraintError) throw new ApiError('conflict:slug');
    throw error;
  }
}

export async function updateWorkspace({
  workspaceId,
  name,
  description,
}: {
  workspaceId: number;
  name?: string;
  description?: string;
}) {
  const { Workspace } = getModels();
  const patch: { name?: string; description?: string } = {};
  if (name !== undefined) patch.name = name;
  if (description !== undefined) patch.description = description;
  await Workspace.update(patch, { where: { id: workspaceId } });
  return Workspace.findByPk(workspaceId);
}

export function toWorkspaceSummary(w: WorkspaceLike, access: WorkspaceAccess, memberCount: number) {
  return summarise(w, access, memberCount);
}

export async function countMembers({ workspaceId }: { workspaceId: number }): Promise<number> {
  const { Membership } = getModels();
  return Membership.count({ where: { workspaceId } });
}
