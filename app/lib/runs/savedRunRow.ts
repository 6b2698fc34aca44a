import type { RunFile } from '@/solver/runFile/schema';
import { describeRunFile } from '@/solver/runFile/describe';

/**
 * The columns of a saved run, derived from its (already checked) run file and result. Shared by
 * the save route and the demo seed, so a seeded run is stored exactly like a saved one.
 */
export interface SavedRunColumns {
  projectId: number | null;
  title: string;
  tags: string[];
  labels: { system: string; basis: string; method: string };
  electrons: number;
  determinantCount: number;
  energyUnit: string;
  referenceEnergy: number | null;
  lowestEnergy: number | null;
  runFileHash: string;
  solverVersion: string;
  runFileJson: string;
  resultJson: string;
  vector: { bytes: Buffer; roots: number; length: number } | null;
}

export interface ResultFacts {
  energyUnit: string;
  determinantCount: number;
  energies: { reference: number; roots: number[] };
  system: { electrons: number };
  provenance: { solverVersion: string; runFileHash: string };
}

export function savedRunColumns({
  runFile,
  runFileAsSent,
  result,
  title,
  tags,
  projectId,
  vector,
}: {
  runFile: RunFile;
  runFileAsSent: unknown;
  result: ResultFacts;
  title: string;
  tags: string[];
  projectId: number | null;
  vector: SavedRunColumns['vector'];
}): SavedRunColumns {
  const roots = result.energies.roots;
  return {
    projectId,
    title,
    tags,
    labels: describeRunFile(runFile),
    electrons: result.system.electrons,
    determinantCount: result.determinantCount,
    energyUnit: result.energyUnit,
    referenceEnergy: result.energies.reference,
    lowestEnergy: roots.length ? roots[0] : result.energies.reference,
    runFileHash: result.provenance.runFileHash,
    solverVersion: result.provenance.solverVersion,
    runFileJson: JSON.stringify(runFileAsSent),
    resultJson: JSON.stringify(result),
    vector,
  };
}
