import { randomBytes } from 'node:crypto';
import type { Seed } from '../umzug';
import { initModels } from '../../models';
import { parseRunFile } from '../../solver/runFile/parse';
import { runCalculation } from '../../solver/run';
import { savedRunColumns } from '../../app/lib/runs/savedRunRow';
import { encodeVectors } from '../../app/lib/runs/vectorCodec';
import type { RunFile } from '../../solver/runFile/schema';
import type { RunResult } from '../../solver/run/result';
import { DEMO_RUNS, type DemoRun } from './demoScenario';

/**
 * The demo group's saved runs, computed here by the solver and stored exactly as the save route
 * stores them (same columns, same compressed vectors). A run already present (same workspace and
 * title) is left alone, so the seed can run again.
 */
export const up: Seed = async ({ context: sequelize }) => {
  const { User, Workspace, Project, Run, RunTag } = initModels(sequelize);
  const computed: { spec: DemoRun; runFile: RunFile; result: RunResult }[] = [];
  for (const spec of DEMO_RUNS) {
    const runFile = parseRunFile(spec.runFile);
    const result = await runCalculation(runFile, { includeVectors: true });
    computed.push({ spec, runFile, result });
  }
  await sequelize.transaction(async (transaction) => {
    for (const { spec, runFile, result } of computed) {
      const workspace = await Workspace.findOne({ where: { slug: spec.workspace }, transaction });
      if (!workspace) continue;
      if (await Run.findOne({ where: { workspaceId: workspace.id, title: spec.title }, transaction })) continue;
      const project = spec.project ? await Project.findOne({ where: { workspaceId: workspace.id, name: spec.project }, transaction }) : null;
      const user = await User.findOne({ where: { email: spec.savedByEmail }, transaction });
      const vectors = result.ci?.vectors;
      const encoded = vectors?.length ? encodeVectors(vectors) : null;
      const stored: RunResult = result.ci ? { ...result, ci: { ...result.ci, vectors: undefined } } : result;
      const columns = savedRunColumns({
        runFile,
        runFileAsSent: runFile,
        result: stored,
        title: spec.title,
        tags: spec.tags,
        projectId: project?.id ?? null,
        vector: encoded ? { bytes: Buffer.from(encoded.bytes), roots: encoded.roots, length: encoded.length } : null,
      });
      const run = await Run.create(
        {
          publicId: randomBytes(12).toString('base64url'),
          workspaceId: workspace.id,
          projectId: columns.projectId,
          createdBy: user?.id ?? null,
          title: columns.title,
          systemLabel: columns.labels.system,
          basisLabel: columns.labels.basis,
          methodLabel: columns.labels.method,
          electrons: columns.electrons,
          determinantCount: columns.determinantCount,
          energyUnit: columns.energyUnit,
          referenceEnergy: columns.referenceEnergy,
          lowestEnergy: columns.lowestEnergy,
          runFileHash: columns.runFileHash,
          solverVersion: columns.solverVersion,
          runFile: columns.runFileJson,
          result: columns.resultJson,
          ciVector: columns.vector?.bytes ?? null,
          ciVectorRoots: columns.vector?.roots ?? null,
          ciVectorLength: columns.vector?.length ?? null,
          ciVectorBytes: columns.vector?.bytes.byteLength ?? null,
        },
        { transaction },
      );
      if (spec.tags.length) await RunTag.bulkCreate(spec.tags.map((tag) => ({ runId: run.id, tag })), { transaction });
    }
  });
};

export const down: Seed = async ({ context: sequelize }) => {
  const { Workspace, Run } = initModels(sequelize);
  await sequelize.transaction(async (transaction) => {
    for (const spec of DEMO_RUNS) {
      const workspace = await Workspace.findOne({ where: { slug: spec.workspace }, transaction });
      if (workspace) await Run.destroy({ where: { workspaceId: workspace.id, title: spec.title }, transaction });
    }
  });
};
