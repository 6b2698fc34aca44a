import 'server-only';
import { randomBytes } from 'node:crypto';
import { Op, type Order, type Transaction, type WhereOptions } from 'sequelize';
import type { Run } from '@/models';
import { ApiError } from '../errors';
import type { ListRunsQuery } from '../runs/saveRunSchema';
import type { SavedRunColumns } from '../runs/savedRunRow';
import { getModels, getSequelize } from '../server/db';
import { recordAudit } from './audit';

/** What the run table shows per run. */
export interface RunSummary {
  id: string;
  title: string;
  system: string;
  basis: string;
  method: string;
  electrons: number;
  determinantCount: number;
  energyUnit: string;
  referenceEnergy: number | null;
  lowestEnergy: number | null;
  runFileHash: string;
  solverVersion: string;
  projectId: number | null;
  projectName: string | null;
  tags: string[];
  createdBy: string | null;
  createdAt: string;
  updatedAt: string;
  hasVector: boolean;
}

/** A saved run as the run page opens it. */
export interface SavedRun extends RunSummary {
  runFile: unknown;
  result: unknown;
  vector: { roots: number; length: number; bytes: number } | null;
}

const SUMMARY_ATTRIBUTES = [
  'id',
  'publicId',
  'workspaceId',
  'projectId',
  'createdBy',
  'title',
  'systemLabel',
  'basisLabel',
  'methodLabel',
  'electrons',
  'determinantCount',
  'energyUnit',
  'referenceEnergy',
  'lowestEnergy',
  'runFileHash',
  'solverVersion',
  'ciVectorRoots',
  'ciVectorLength',
  'ciVectorBytes',
  'createdAt',
  'updatedAt',
] as const;

type RunWithIncludes = Run & {
  tags?: { tag: string }[];
  project?: { name: string } | null;
  creator?: { displayName: string } | null;
};

function toSummary(run: RunWithIncludes): RunSummary {
  return {
    id: run.publicId,
    title: run.title,
    system: run.systemLabel,
    basis: run.basisLabel,
    method: run.methodLabel,
    electrons: run.electrons,
    determinantCount: Number(run.determinantCount),
    energyUnit: run.energyUnit,
    referenceEnergy: run.referenceEnergy,
    lowestEnergy: run.lowestEnergy,
    runFileHash: run.runFileHash,
    solverVersion: run.solverVersion,
    projectId: run.projectId,
    projectName: run.project?.name ?? null,
    tags: (run.tags ?? []).map((t) => t.tag).sort(),
    createdBy: run.creator?.displayName ?? null,
    createdAt: new Date(run.createdAt).toISOString(),
    updatedAt: new Date(run.updatedAt).toISOString(),
    hasVector: run.ciVectorBytes !== null,
  };
}

function includes() {
  const { RunTag, Project, User } = getModels();
  return [
    { model: RunTag, as: 'tags', attributes: ['tag'] },
    { model: Project, as: 'project', attributes: ['name'] },
    { model: User, as: 'creator', attributes: ['displayName'] },
  ];
}

/** Random, URL-safe and unguessable: the stable address of a saved run. */
export function newRunPublicId(): string {
  return randomBytes(12).toString('base64url');
}

export type NewRun = SavedRunColumns & { workspaceId: number; userId: number; clientAddress: string | null };

/** Inside a transaction: a project given with a run or scan must belong to the same workspace. */
export async function requireProjectInWorkspace(projectId: number | null | undefined, workspaceId: number, transaction: Transaction) {
  if (projectId === null || projectId === undefined) return;
  const { Project } = getModels();
  const project = await Project.findOne({ where: { id: projectId, workspaceId }, transaction });
  if (!project) throw new ApiError('bad_request:validation', { fields: { projectId: ['No such project in this workspace.'] } });
}

/** The run, its tags and the audit entry in one transaction: a failure leaves no row behind. */
export async function createRun(input: NewRun): Promise<RunSummary> {
  const { Run, RunTag } = getModels();
  const publicId = await getSequelize().transaction(async (transaction) => {
    await requireProjectInWorkspace(input.projectId, input.workspaceId, transaction);
    const run = await Run.create(
      {
        publicId: newRunPublicId(),
        workspaceId: input.workspaceId,
        projectId: input.projectId,
        createdBy: input.userId,
        title: input.title,
        systemLabel: input.labels.system.slice(0, 120),
        basisLabel: input.labels.basis.slice(0, 80),
        methodLabel: input.labels.method.slice(0, 80),
        electrons: input.electrons,
        determinantCount: input.determinantCount,
        energyUnit: input.energyUnit,
        referenceEnergy: input.referenceEnergy,
        lowestEnergy: input.lowestEnergy,
        runFileHash: input.runFileHash,
        solverVersion: input.solverVersion,
        runFile: input.runFileJson,
        result: input.resultJson,
        ciVector: input.vector?.bytes ?? null,
        ciVectorRoots: input.vector?.roots ?? null,
        ciVectorLength: input.vector?.length ?? null,
        ciVectorBytes: input.vector?.bytes.byteLength ?? null,
      },
      { transaction },
    );
    if (input.tags.length) await RunTag.bulkCreate(input.tags.map((tag) => ({ runId: run.id, tag })), { transaction });
    await recordAudit({
      actorId: input.userId,
      action: 'run.create',
      workspaceId: input.workspaceId,
      targetType: 'run',
      targetId: run.publicId,
      clientAddress: input.clientAddress,
      detail: { title: input.title, method: input.labels.method, vectorBytes: input.vector?.bytes.byteLength ?? 0 },
      transaction,
    });
    return run.publicId;
  });
  const summary = await findRunSummary({ workspaceId: input.workspaceId, publicId });
  return summary!;
}

const SORT_COLUMNS: Record<ListRunsQuery['sort'], string> = {
  created: 'createdAt',
  title: 'title',
  system: 'systemLabel',
  method: 'methodLabel',
  energy: 'lowestEnergy',
  determinants: 'determinantCount',
};

function escapeLike(text: string): string {
  return text.replace(/[\\%_]/g, (c) => `\\${c}`);
}

export async function listRuns(workspaceId: number, query: ListRunsQuery): Promise<{ runs: RunSummary[]; total: number; page: number; pageSize: number }> {
  const { Run, RunTag } = getModels();
  const where: WhereOptions = { workspaceId };
  const and: WhereOptions[] = [];
  if (query.q) {
    const like = `%${escapeLike(query.q)}%`;
    and.push({ [Op.or]: [{ title: { [Op.like]: like } }, { systemLabel: { [Op.like]: like } }, { methodLabel: { [Op.like]: like } }, { basisLabel: { [Op.like]: like } }] });
  }
  if (query.method) and.push({ methodLabel: { [Op.like]: `%${escapeLike(query.method)}%` } });
  if (query.projectId) and.push({ projectId: query.projectId });
  if (query.tag) {
    const tagged = await RunTag.findAll({ where: { tag: query.tag }, attributes: ['runId'] });
    and.push({ id: { [Op.in]: tagged.map((t) => t.runId) } });
  }
  if (and.length) Object.assign(where, { [Op.and]: and });
  const column = SORT_COLUMNS[query.sort];
  const direction = query.dir.toUpperCase() as 'ASC' | 'DESC';
  // A second key (the row id) keeps pages stable when many rows share the first.
  const order: Order = [[column, direction], ['id', direction]];
  const total = await Run.count({ where });
  const rows = await Run.findAll({
    where,
    attributes: [...SUMMARY_ATTRIBUTES],
    include: includes(),
    order,
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  });
  return { runs: rows.map((r) => toSummary(r as RunWithIncludes)), total, page: query.page, pageSize: query.pageSize };
}

export async function findRunSummary({ workspaceId, publicId }: { workspaceId: number; publicId: string }): Promise<RunSummary | null> {
  const { Run } = getModels();
  const run = await Run.findOne({ where: { workspaceId, publicId }, attributes: [...SUMMARY_ATTRIBUTES], include: includes() });
  return run ? toSummary(run as RunWithIncludes) : null;
}

export async function findSavedRun({ workspaceId, publicId }: { workspaceId: number; publicId: string }): Promise<SavedRun | null> {
  const { Run } = getModels();
  const run = await Run.findOne({
    where: { workspaceId, publicId },
    attributes: [...SUMMARY_ATTRIBUTES, 'runFile', 'result'],
    include: includes(),
  });
  if (!run) return null;
  return {
    ...toSummary(run as RunWithIncludes),
    runFile: JSON.parse(run.runFile),
    result: JSON.parse(run.result),
    vector:
      run.ciVectorBytes !== null ? { roots: run.ciVectorRoots!, length: run.ciVectorLength!, bytes: run.ciVectorBytes } : null,
  };
}

export async function readRunVector({ workspaceId, publicId }: { workspaceId: number; publicId: string }) {
  const { Run } = getModels();
  const run = await Run.findOne({ where: { workspaceId, publicId }, attributes: ['id', 'ciVector', 'ciVectorRoots', 'ciVectorLength'] });
  if (!run) throw new ApiError('not_found:run');
  if (!run.ciVector) return null;
  return { bytes: run.ciVector, roots: run.ciVectorRoots!, length: run.ciVectorLength! };
}

export async function updateRun({
  workspaceId,
  publicId,
  userId,
  title,
  tags,
  projectId,
  clientAddress,
}: {
  workspaceId: number;
  publicId: string;
  userId: number;
  title?: string;
  tags?: string[];
  projectId?: number | null;
  clientAddress: string | null;
}): Promise<RunSummary> {
  const { Run, RunTag } = getModels();
  await getSequelize().transaction(async (transaction) => {
    const run = await Run.findOne({ where: { workspaceId, publicId }, attributes: ['id', 'title', 'projectId'], transaction });
    if (!run) throw new ApiError('not_found:run');
    await requireProjectInWorkspace(projectId, workspaceId, transaction);
    const patch: { title?: string; projectId?: number | null } = {};
    if (title !== undefined) patch.title = title;
    if (projectId !== undefined) patch.projectId = projectId;
    // A static update always stamps updated_at, so a change of tags alone still moves it.
    await Run.update({ title: run.title, ...patch }, { where: { id: run.id }, transaction });
    if (tags !== undefined) {
      await RunTag.destroy({ where: { runId: run.id }, transaction });
      if (tags.length) await RunTag.bulkCreate(tags.map((tag) => ({ runId: run.id, tag })), { transaction });
    }
    await recordAudit({
      actorId: userId,
      action: 'run.edit',
      workspaceId,
      targetType: 'run',
      targetId: publicId,
      clientAddress,
      detail: { from: run.title, title, tags, projectId },
      transaction,
    });
  });
  return (await findRunSummary({ workspaceId, publicId }))!;
}

export async function deleteRun({ workspaceId, publicId, userId, clientAddress }: { workspaceId: number; publicId: string; userId: number; clientAddress: string | null }) {
  const { Run } = getModels();
  await getSequelize().transaction(async (transaction) => {
    const run = await Run.findOne({ where: { workspaceId, publicId }, attributes: ['id', 'title'], transaction });
    if (!run) throw new ApiError('not_found:run');
    await Run.destroy({ where: { id: run.id }, transaction });
    await recordAudit({ actorId: userId, action: 'run.delete', workspaceId, targetType: 'run', targetId: publicId, clientAddress, detail: { title: run.title }, transaction });
  });
}

/** Every tag used in a workspace, for the table's filter. */
export async function listRunTags(workspaceId: number): Promise<string[]> {
  const { RunTag, Run } = getModels();
  const rows = await RunTag.findAll({
    attributes: ['tag'],
    include: [{ model: Run, as: 'run', attributes: [], where: { workspaceId }, required: true }],
    group: ['tag'],
    order: [['tag', 'ASC']],
  });
  return rows.map((r) => r.tag);
}
