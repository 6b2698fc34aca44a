import 'server-only';
import { Op, UniqueConstraintError, type Transaction } from 'sequelize';
import { ApiError } from '../errors';
import type { WorkspaceRole } from '../permissions';
import { getModels, getSequelize } from '../server/db';
import { createToken, hashToken, INVITATION_LIFETIME_MS } from '../tokens';
import { normaliseEmail } from './users';

export interface InvitationRow {
  id: number;
  email: string;
  role: WorkspaceRole;
  invitedBy: number | null;
  expiresAt: string;
  createdAt: string;
  status: 'pending' | 'accepted' | 'revoked' | 'expired';
}

type InvitationLike = {
  id: number;
  email: string;
  role: WorkspaceRole;
  invitedBy: number | null;
  expiresAt: Date;
  acceptedAt: Date | null;
  revokedAt: Date | null;
  createdAt: Date;
};

export function invitationStatus(inv: Pick<InvitationLike, 'expiresAt' | 'acceptedAt' | 'revokedAt'>, now = new Date()) {
  if (inv.acceptedAt) return 'accepted' as const;
  if (inv.revokedAt) return 'revoked' as const;
  if (new Date(inv.expiresAt).getTime() <= now.getTime()) return 'expired' as const;
  return 'pending' as const;
}

function toRow(inv: InvitationLike): InvitationRow {
  return {
    id: inv.id,
    email: inv.email,
    role: inv.role,
    invitedBy: inv.invitedBy ?? null,
    expiresAt: new Date(inv.expiresAt).toISOString(),
    createdAt: new Date(inv.createdAt).toISOString(),
    status: invitationStatus(inv),
  };
}

/** Invitations that can still be accepted, newest first. */
export async function listPendingInvitations({ workspaceId }: { workspaceId: number }): Promise<InvitationRow[]> {
  const { Invitation } = getModels();
  const rows = await Invitation.findAll({
    where: { workspaceId, acceptedAt: null, revokedAt: null, expiresAt: { [Op.gt]: new Date() } },
    order: [['createdAt', 'DESC']],
  });
  return rows.map(toRow);
}

export async function createInvitation({
  workspaceId,
  email,
  role,
  invitedBy,
}: {
  workspaceId: number;
  email: string;
  role: WorkspaceRole;
  invitedBy: number;
}): Promise<{ invitation: InvitationRow; token: string }> {
  const { Invitation, Membership, User } = getModels();
  const address = normaliseEmail(email);
  const existingUser = await User.findOne({ where: { email: address } });
  if (existingUser) {
    const member = await Membership.findOne({ where: { workspaceId, userId: existingUser.id } });
    if (member) throw new ApiError('conflict:member');
  }
  const pending = await Invitation.findOne({
    where: { workspaceId, email: address, acceptedAt: null, revokedAt: null, expiresAt: { [Op.gt]: new Date() } },
  });
  if (pending) throw new ApiError('conflict:invitation');
  const { token, tokenHash } = createToken();
  const invitation = await Invitation.create({
    workspaceId,
    email: address,
    role,
    tokenHash,
    invitedBy,
    expiresAt: new Date(Date.now() + INVITATION_LIFETIME_MS),
    acceptedAt: null,
    acceptedBy: null,
    revokedAt: null,
  });
  return { invitation: toRow(invitation), token };
}

export async function revokeInvitation({ workspaceId, invitationId }: { workspaceId: number; invitationId: number }) {
  const { Invitation } = getModels();
  const invitation = await Invitation.findOne({ where: { id: invitationId, workspaceId } });
  if (!invitation) throw new ApiError('not_found:invitation');
  if (invitationStatus(invitation) !== 'pending') throw new ApiError('unprocessable:token', { message: 'This invitation is no longer pending.' });
  await Invitation.update({ revokedAt: new Date() }, { where: { id: invitationId } });
}

/** Looks an invitation up by the token from its link; null when the token is unknown. */
export async function findInvitationByToken({ token }: { token: string }) {
  const { Invitation, Workspace } = getModels();
  const invitation = await Invitation.findOne({ where: { tokenHash: hashToken(token) } });
  if (!invitation) return null;
  const workspace = await Workspace.findByPk(invitation.workspaceId);
  if (!workspace) return null;
  return { invitation, workspace, status: invitationStatus(invitation) };
}

/**
 * Accepts an invitation for a user whose e-mail matches it. Single use: the row is
 * locked, and accepted/revoked/expired invitations are refused with 422.
 */
export async function acceptInvitation({
  token,
  user,
  transaction: outer,
}: {
  token: string;
  user: { id: number; email: string };
  transaction?: Transaction;
}): Promise<{ workspaceId: number; workspaceSlug: string; role: WorkspaceRole; invitationId: number }> {
  const { Invitation, Membership, Workspace } = getModels();
  const work = async (transaction: Transaction) => {
    const invitation = await Invitation.findOne({
      where: { tokenHash: hashToken(token) },
      lock: transaction.LOCK.UPDATE,
      transaction,
    });
    if (!invitation) throw new ApiError('not_found:invitation');
    if (invitationStatus(invitation) !== 'pending') throw new ApiError('unprocessable:token');
    if (normaliseEmail(invitation.email) !== normaliseEmail(user.email)) {
      throw new ApiError('unprocessable:invitation-email');
    }
    const existing = await Membership.findOne({ where: { workspaceId: invitation.workspaceId, userId: user.id }, transaction });
    if (existing) throw new ApiError('conflict:member');
    try {
      await Membership.create({ workspaceId: invitation.workspaceId, userId: user.id, role: invitation.role }, { transaction });
    } catch (error) {
      if (error instanceof UniqueConstraintError) throw new ApiError('conflict:member');
      throw error;
    }
    await Invitation.update({ acceptedAt: new Date(), acceptedBy: user.id }, { where: { id: invitation.id }, transaction });
    const workspace = await Workspace.findByPk(invitation.workspaceId, { transaction });
    return {
      workspaceId: invitation.workspaceId,
      workspaceSlug: workspace!.slug,
      role: invitation.role,
      invitationId: invitation.id,
    };
  };
  return outer ? work(outer) : getSequelize().transaction(work);
}
