export { buildBasis } from './buildBasis';
export { basisSpecSchema, zetaSchema, STO_NAMES, type BasisSpec, type ZetaSpec, type StoName } from './schema';
export { cartesianCount, cartesianExponents, cartesianSuffixes, componentNormFactor } from './cartesian';
export { primitiveNorm, normaliseContraction } from './normalise';
export { STANDARD_ZETA, resolveZeta } from './slaterExponents';
