import 'server-only';
import { Op, type WhereOptions } from 'sequelize';
import type { Scan } from '@/models';
import { ApiError } from '../errors';
import type { ListScansQuery } from '../runs/scanSchemas';
import { getModels, getSequelize } from '../server/db';
import { recordAudit } from './audit';
import { newRunPublicId, requireProjectInWorkspace } from './runs';

export interface ScanSummary {
  id: string;
  title: string;
  system: string;
  basis: string;
  methods: string;
  pointCount: number;
  pointsDone: number;
  status: 'running' | 'done' | 'cancelled';
  projectId: number | null;
  createdBy: string | null;
  createdAt: string;
  updatedAt: string;
}

export interface SavedScan extends ScanSummary {
  scanFile: unknown;
  scanFileHash: string;
  points: { index: number; result: unknown }[];
  summary: unknown | null;
}

type ScanWithIncludes = Scan & { creator?: { displayName: string } | null };

async function pointsDone(scanIds: number[]): Promise<Map<number, number>> {
  const { ScanPoint } = getModels();
  if (!scanIds.length) return new Map();
  const rows = (await ScanPoint.findAll({
    attributes: ['scanId', [getSequelize().fn('COUNT', getSequelize().col('point_index')), 'done']],
    where: { scanId: scanIds },
    group: ['scanId'],
    raw: true,
  })) as unknown as { scanId: number; done: number | string }[];
  return new Map(rows.map((r) => [r.scanId, Number(r.done)]));
}

function toSummary(scan: ScanWithIncludes, done: number): ScanSummary {
  return {
    id: scan.publicId,
    title: scan.title,
    system: scan.systemLabel,
    basis: scan.basisLabel,
    methods: scan.methodsLabel,
    pointCount: scan.pointCount,
    pointsDone: done,
    status: scan.status,
    projectId: scan.projectId,
    createdBy: scan.creator?.displayName ?? null,
    createdAt: new Date(scan.createdAt).toISOString(),
    updatedAt: new Date(scan.updatedAt).toISOString(),
  };
}

const SUMMARY_ATTRIBUTES = ['id', 'publicId', 'workspaceId', 'projectId', 'createdBy', 'title', 'systemLabel', 'basisLabel', 'methodsLabel', 'pointCount', 'status', 'scanFileHash', 'createdAt', 'updatedAt'] as const;

function creatorInclude() {
  const { User } = getModels();
  return [{ model: User, as: 'creator', attributes: ['displayName'] }];
}

export async function createScan(input: {
  workspaceId: number;
  projectId: number | null;
  userId: number;
  title: string;
  labels: { system: string; basis: string; methods: string };
  pointCount: number;
  scanFileHash: string;
  scanFileJson: string;
  clientAddress: string | null;
}): Promise<ScanSummary> {
  const { Scan } = getModels();
  const publicId = await getSequelize().transaction(async (transaction) => {
    await requireProjectInWorkspace(input.projectId, input.workspaceId, transaction);
    const scan = await Scan.create(
      {
        publicId: newRunPublicId(),
        workspaceId: input.workspaceId,
        projectId: input.projectId,
        createdBy: input.userId,
        title: input.title,
        systemLabel: input.labels.system.slice(0, 120),
        basisLabel: input.labels.basis.slice(0, 80),
        methodsLabel: input.labels.methods.slice(0, 200),
        pointCount: input.pointCount,
        scanFileHash: input.scanFileHash,
        scanFile: input.scanFileJson,
        summary: null,
      },
      { transaction },
    );
    await recordAudit({ actorId: input.userId, action: 'scan.create', workspaceId: input.workspaceId, targetType: 'scan', targetId: scan.publicId, clientAddress: input.clientAddress, detail: { title: input.title }, transaction });
    return scan.publicId;
  });
  return (await findScanSummary(input.workspaceId, publicId))!;
}

export async function findScanSummary(workspaceId: number, publicId: string): Promise<ScanSummary | null> {
  const { Scan } = getModels();
  const scan = await Scan.findOne({ where: { workspaceId, publicId }, attributes: [...SUMMARY_ATTRIBUTES], include: creatorInclude() });
  if (!scan) return null;
  const done = await pointsDone([scan.id]);
  return toSummary(scan as ScanWithIncludes, done.get(scan.id) ?? 0);
}

export async function listScans(workspaceId: number, query: ListScansQuery) {
  const { Scan } = getModels();
  const where: WhereOptions = { workspaceId };
  if (query.q) {
    const like = `%${query.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
    Object.assign(where, { [Op.or]: [{ title: { [Op.like]: like } }, { systemLabel: { [Op.like]: like } }, { methodsLabel: { [Op.like]: like } }] });
  }
  const direction = query.dir.toUpperCase() as 'ASC' | 'DESC';
  const total = await Scan.count({ where });
  const rows = await Scan.findAll({
    where,
    attributes: [...SUMMARY_ATTRIBUTES],
    include: creatorInclude(),
    order: [[query.sort === 'title' ? 'title' : 'createdAt', direction], ['id', direction]],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  });
  const done = await pointsDone(rows.map((r) => r.id));
  return { scans: rows.map((r) => toSummary(r as ScanWithIncludes, done.get(r.id) ?? 0)), total, page: query.page, pageSize: query.pageSize };
}

export async function findSavedScan(workspaceId: number, publicId: string): Promise<SavedScan | null> {
  const { Scan, ScanPoint } = getModels();
  const scan = await Scan.findOne({ where: { workspaceId, publicId }, attributes: [...SUMMARY_ATTRIBUTES, 'scanFile', 'summary'], include: creatorInclude() });
  if (!scan) return null;
  const points = await ScanPoint.findAll({ where: { scanId: scan.id }, order: [['pointIndex', 'ASC']] });
  return {
    ...toSummary(scan as ScanWithIncludes, points.length),
    scanFile: JSON.parse(scan.scanFile),
    scanFileHash: scan.scanFileHash,
    points: points.map((p) => ({ index: p.pointIndex, result: JSON.parse(p.result) })),
    summary: scan.summary === null ? null : JSON.parse(scan.summary),
  };
}

export async function saveScanPoint({ workspaceId, publicId, index, resultJson }: { workspaceId: number; publicId: string; index: number; resultJson: string }): Promise<number> {
  const { Scan, ScanPoint } = getModels();
  return getSequelize().transaction(async (transaction) => {
    const scan = await Scan.findOne({ where: { workspaceId, publicId }, attributes: ['id', 'pointCount'], transaction, lock: transaction.LOCK.UPDATE });
    if (!scan) throw new ApiError('not_found:scan');
    if (index >= scan.pointCount) throw new ApiError('bad_request:validation', { fields: { index: [`This scan has ${scan.pointCount} points (0 to ${scan.pointCount - 1}).`] } });
    await ScanPoint.upsert({ scanId: scan.id, pointIndex: index, result: resultJson }, { transaction });
    // A new point also means the stored summary (if any) no longer covers every point.
    await Scan.update({ status: 'running' }, { where: { id: scan.id, status: 'done' }, transaction });
    return ScanPoint.count({ where: { scanId: scan.id }, transaction });
  });
}

export async function updateScan({ workspaceId, publicId, userId, title, status, summaryJson, clientAddress }: {
  workspaceId: number;
  publicId: string;
  userId: number;
  title?: string;
  status?: 'running' | 'done' | 'cancelled';
  summaryJson?: string | null;
  clientAddress: string | null;
}): Promise<ScanSummary> {
  const { Scan } = getModels();
  await getSequelize().transaction(async (transaction) => {
    const scan = await Scan.findOne({ where: { workspaceId, publicId }, attributes: ['id', 'title'], transaction });
    if (!scan) throw new ApiError('not_found:scan');
    const patch: { title?: string; status?: 'running' | 'done' | 'cancelled'; summary?: string | null } = {};
    if (title !== undefined) patch.title = title;
    if (status !== undefined) patch.status = status;
    if (summaryJson !== undefined) patch.summary = summaryJson;
    await Scan.update({ title: scan.title, ...patch }, { where: { id: scan.id }, transaction });
    if (title !== undefined) {
      await recordAudit({ actorId: userId, action: 'scan.edit', workspaceId, targetType: 'scan', targetId: publicId, clientAddress, detail: { from: scan.title, title }, transaction });
    }
  });
  return (await findScanSummary(workspaceId, publicId))!;
}

export async function deleteScan({ workspaceId, publicId, userId, clientAddress }: { workspaceId: number; publicId: string; userId: number; clientAddress: string | null }) {
  const { Scan } = getModels();
  await getSequelize().transaction(async (transaction) => {
    const scan = await Scan.findOne({ where: { workspaceId, publicId }, attributes: ['id', 'title'], transaction });
    if (!scan) throw new ApiError('not_found:scan');
    await Scan.destroy({ where: { id: scan.id }, transaction });
    await recordAudit({ actorId: userId, action: 'scan.delete', workspaceId, targetType: 'scan', targetId: publicId, clientAddress, detail: { title: scan.title }, transaction });
  });
}
