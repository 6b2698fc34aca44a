/**
 * Molecular point-group symmetry restricted to D2h and its subgroups: the frame a molecule is
 * oriented in, the operations as sign patterns, character tables with XOR-multiplying irrep
 * integers, and irrep labels of orbitals, determinants and CI roots.
 */
export { symmetryFrame, type MolecularSymmetry } from './symmetryFrame';
export {
  D2H_OPERATIONS,
  operationByName,
  operationByMask,
  composeOperations,
  monomialSign,
  type OperationName,
  type SymmetryOperation,
} from './operations';
export {
  POINT_GROUP_NAMES,
  characterTable,
  isPointGroupName,
  irrepLabel,
  irrepIndex,
  irrepProduct,
  irrepCharacter,
  irrepOfParity,
  type PointGroupName,
  type CharacterTable,
} from './characterTables';
export { atomPermutation, permutationUnderMap } from './atomPermutation';
export { atomKinds } from './atomKinds';
export { basisFunctionOperation, cartesianComponents } from './basisFunctionOperation';
export { orbitalIrreps, type OrbitalIrreps } from './orbitalIrreps';
export { determinantIrrep, rootIrrep, type OccupationString } from './determinantIrrep';
export { numberedOrbitalLabels } from './orbitalLabels';
export { symmetricEigen3 } from './symmetricEigen3';
