export { boysFunction, boysValues, MAX_BOYS_ORDER } from './boys';
export { overlapMatrix, kineticMatrix, nuclearAttractionMatrix, dipoleMatrices } from './oneElectron';
export { electronRepulsionIntegrals, type ElectronRepulsionOptions } from './electronRepulsion';
export { eriIndex, eriLength, pairIndex } from './eriIndex';
