import 'server-only';
import type { Transaction } from 'sequelize';
import { ApiError } from '../errors';
import type { WorkspaceRole } from '../permissions';
import { getModels, getSequelize } from '../server/db';

export interface MemberRow {
  userId: number;
  displayName: string;
  email: string;
  role: WorkspaceRole;
  joinedAt: string;
}

const roleOrder: Record<WorkspaceRole, number> = { owner: 0, editor: 1, viewer: 2 };

export async function listMembers({ workspaceId }: { workspaceId: number }): Promise<MemberRow[]> {
  const { Membership, User } = getModels();
  const memberships = await Membership.findAll({ where: { workspaceId } });
  const users = memberships.length
    ? await User.findAll({ where: { id: memberships.map((m) => m.userId) } })
    : [];
  const userById = new Map(users.map((u) => [u.id, u]));
  return memberships
    .flatMap((m) => {
      const u = userById.get(m.userId);
      return u
        ? [{ userId: u.id, displayName: u.displayName, email: u.email, role: m.role, joinedAt: new Date(m.createdAt).toISOString() }]
        : [];
    })
    .sort((a, b) => roleOrder[a.role] - roleOrder[b.role] || a.displayName.localeCompare(b.displayName));
}

/**
 * Owner rows are locked for the check so two owners demoting each other at the same
 * time cannot leave the workspace without an owner.
 */
async function lockOwners(workspaceId: number, transaction: Transaction) {
  const { Membership } = getModels();
  return Membership.findAll({ where: { workspaceId, role: 'owner' }, lock: transaction.LOCK.UPDATE, transaction });
}

export async function changeMemberRole({
  workspaceId,
  userId,
  role,
}: {
  workspaceId: number;
  userId: number;
  role: WorkspaceRole;
}): Promise<{ previousRole: WorkspaceRole }> {
  const { Membership } = getModels();
  return getSequelize().transaction(async (transaction: Transaction) => {
    const owners = await lockOwners(workspaceId, transaction);
    const membership = await Membership.findOne({ where: { workspaceId, userId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!membership) throw new ApiError('not_found:member');
    const previousRole = membership.role;
    if (previousRole === 'owner' && role !== 'owner' && owners.length <= 1) {
      throw new ApiError('conflict:last-owner');
    }
    if (previousRole !== role) {
      await Membership.update({ role }, { where: { id: membership.id }, transaction });
    }
    return { previousRole };
  });
}

export async function removeMember({
  workspaceId,
  userId,
}: {
  workspaceId: number;
  userId: number;
}): Promise<{ previousRole: WorkspaceRole }> {
  const { Membership } = getModels();
  return getSequelize().transaction(async (transaction: Transaction) => {
    const owners = await lockOwners(workspaceId, transaction);
    const membership = await Membership.findOne({ where: { workspaceId, userId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!membership) throw new ApiError('not_found:member');
    if (membership.role === 'owner' && owners.length <= 1) throw new ApiError('conflict:last-owner');
    await Membership.destroy({ where: { id: membership.id }, transaction });
    return { previousRole: membership.role };
  });
}
