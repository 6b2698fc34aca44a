import 'server-only';
import { UniqueConstraintError } from 'sequelize';
import { ApiError } from '../errors';
import { getModels } from '../server/db';

export interface ProjectRow {
  id: number;
  workspaceId: number;
  name: string;
  description: string;
  createdAt: string;
  updatedAt: string;
}

function toRow(p: { id: number; workspaceId: number; name: string; description: string; createdAt: Date; updatedAt: Date }): ProjectRow {
  return {
    id: p.id,
    workspaceId: p.workspaceId,
    name: p.name,
    description: p.description,
    createdAt: new Date(p.createdAt).toISOString(),
    updatedAt: new Date(p.updatedAt).toISOString(),
  };
}

export async function listProjects({ workspaceId }: { workspaceId: number }): Promise<ProjectRow[]> {
  const { Project } = getModels();
  const rows = await Project.findAll({ where: { workspaceId }, order: [['name', 'ASC']] });
  return rows.map(toRow);
}

export async function findProject({ workspaceId, projectId }: { workspaceId: number; projectId: number }) {
  const { Project } = getModels();
  return Project.findOne({ where: { workspaceId, id: projectId } });
}

export async function createProject({
  workspaceId,
  name,
  description,
  userId,
}: {
  workspaceId: number;
  name: string;
  description: string;
  userId: number;
}): Promise<ProjectRow> {
  const { Project } = getModels();
  try {
    const project = await Project.create({ workspaceId, name, description, createdBy: userId });
    return toRow(project);
  } catch (error) {
    if (error instanceof UniqueConstraintError) throw new ApiError('conflict:project-name');
    throw error;
  }
}

export async function updateProject({
  workspaceId,
  projectId,
  name,
  description,
}: {
  workspaceId: number;
  projectId: number;
  name?: string;
  description?: string;
}): Promise<ProjectRow> {
  const { Project } = getModels();
  const project = await Project.findOne({ where: { workspaceId, id: projectId } });
  if (!project) throw new ApiError('not_found:project');
  const patch: { name?: string; description?: string } = {};
  if (name !== undefined) patch.name = name;
  if (description !== undefined) patch.description = description;
  try {
    await Project.update(patch, { where: { id: projectId } });
  } catch (error) {
    if (error instanceof UniqueConstraintError) throw new ApiError('conflict:project-name');
    throw error;
  }
  const updated = await Project.findByPk(projectId);
  return toRow(updated!);
}

export async function deleteProject({ workspaceId, projectId }: { workspaceId: number; projectId: number }) {
  const { Project } = getModels();
  const removed = await Project.destroy({ where: { workspaceId, id: projectId } });
  if (removed === 0) throw new ApiError('not_found:project');
}
