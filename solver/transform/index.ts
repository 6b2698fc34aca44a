export { moIntegrals, type MoIntegrals } from './moIntegrals';
export { orbitalHamiltonian, type OrbitalHamiltonianInput } from './orbitalHamiltonian';
export { transformEri, selectColumns, transformOneIndexPair } from './transformEri';
