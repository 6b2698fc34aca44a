/**
 * Scans: a series of runs along a coordinate. The steps are separate so that a browser pool
 * can run the points in its workers and save each as it finishes:
 *   planScan(runFile)                       → points, per-point run files, methods, fragments
 *   runScanPoint(pointRunFile, methods, …)  → one point's energies, SCF solutions and state data
 *   assembleScan(plan, pointResults, …)     → curves, flags and constants
 * and `runScan` does all three in order for the CLI. A ladder (the same system across bases)
 * has the same shape: planLadder → runLadderBasis per basis → assembleLadder, or runLadder.
 */
export { planScan, planMethods, scanPointRunFile, fragmentMethod, methodLabel } from './planScan';
export { planLadder, runLadderBasis, assembleLadder, runLadder, type LadderPlan, type LadderRow, type AssembledLadder } from './ladder';
export { runScanPoint, FOLLOWING_DETERMINANTS, type ScanPointOptions } from './runScanPoint';
export { assembleScan, type AssembleOptions } from './assembleScan';
export { runScan, type RunScanOptions } from './runScan';
export { scanToCsv, scanToJson } from './exportScan';
export { fitMinimum, refineMinimum } from './fitMinimum';
export { followStates, characterOverlap } from './followStates';
export { chooseScfSolution } from './chooseScfSolution';
export { reducedMassElectronMasses, mostAbundantIsotopeMassU } from './isotopeMasses';
export type * from './types';
