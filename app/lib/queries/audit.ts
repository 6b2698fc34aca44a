import 'server-only';
import type { InferCreationAttributes, Transaction } from 'sequelize';
import type { AuditEntry } from '@/models';
import { getModels } from '../server/db';

export type AuditAction =
  | 'user.sign-up'
  | 'user.sign-in'
  | 'user.sign-in-failed'
  | 'user.sign-out'
  | 'workspace.create'
  | 'workspace.rename'
  | 'invitation.create'
  | 'invitation.revoke'
  | 'invitation.accept'
  | 'membership.role-change'
  | 'membership.remove'
  | 'project.create'
  | 'project.rename'
  | 'project.delete'
  | 'run.create'
  | 'run.edit'
  | 'run.delete'
  | 'scan.create'
  | 'scan.edit'
  | 'scan.delete'
  | 'password.reset-request'
  | 'password.reset';

export interface AuditInput {
  actorId: number | null;
  action: AuditAction;
  workspaceId?: number | null;
  targetType?: string | null;
  targetId?: string | number | null;
  clientAddress?: string | null;
  detail?: Record<string, unknown> | null;
  transaction?: Transaction;
}

export async function recordAudit(input: AuditInput): Promise<void> {
  const { AuditEntry } = getModels();
  // `detail` is a JSON column; the model types it loosely, so the attributes are typed here.
  const attributes = {
      actorId: input.actorId,
      action: input.action,
      workspaceId: input.workspaceId ?? null,
      targetType: input.targetType ?? null,
      targetId: input.targetId == null ? null : String(input.targetId),
      clientAddress: input.clientAddress ?? null,
      detail: input.detail ?? null,
  } as InferCreationAttributes<AuditEntry>;
  await AuditEntry.create(attributes, { transaction: input.transaction });
}

export interface AuditRow {
  id: string;
  action: string;
  actorId: number | null;
  actorEmail: string | null;
  workspaceId: number | null;
  targetType: string | null;
  targetId: string | null;
  clientAddress: string | null;
  detail: unknown;
  createdAt: string;
}

export async function listAuditEntries({ limit = 200, beforeId }: { limit?: number; beforeId?: number } = {}): Promise<
  AuditRow[]
> {
  const { AuditEntry, User } = getModels();
  const { Op } = await import('sequelize');
  const rows = await AuditEntry.findAll({
    where: beforeId ? { id: { [Op.lt]: beforeId } } : {},
    order: [['id', 'DESC']],
    limit,
  });
  const actorIds = [...new Set(rows.map((r) => r.actorId).filter((id): id is number => id != null))];
  const actors = actorIds.length ? await User.findAll({ where: { id: actorIds } }) : [];
  const emailById = new Map(actors.map((u) => [u.id, u.email]));
  return rows.map((r) => ({
    id: String(r.id),
    action: r.action,
    actorId: r.actorId ?? null,
    actorEmail: r.actorId != null ? (emailById.get(r.actorId) ?? null) : null,
    workspaceId: r.workspaceId ?? null,
    targetType: r.targetType ?? null,
    targetId: r.targetId ?? null,
    clientAddress: r.clientAddress ?? null,
    detail: parseDetail(r.detail),
    createdAt: new Date(r.createdAt).toISOString(),
  }));
}

function parseDetail(detail: unknown): unknown {
  if (typeof detail !== 'string') return detail ?? null;
  try {
    return JSON.parse(detail);
  } catch {
    return detail;
  }
}
