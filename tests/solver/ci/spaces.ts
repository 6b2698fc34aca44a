/** The kinds of CI space the tests sweep: full CI, excitation levels, RAS, irrep-restricted. */
import type { CiSpaceSpec } from '../../../solver/ci/spaceSpec';

export interface SpaceCase {
  name: string;
  spec: CiSpaceSpec;
  irreps?: number[];
}

export const spaceCases: SpaceCase[] = [
  { name: 'FCI 6o 3α3β', spec: { nOrbitals: 6, nAlpha: 3, nBeta: 3, maxExcitation: null } },
  { name: 'FCI 6o 3α2β', spec: { nOrbitals: 6, nAlpha: 3, nBeta: 2, maxExcitation: null } },
  { name: 'CIS 7o 3α3β', spec: { nOrbitals: 7, nAlpha: 3, nBeta: 3, maxExcitation: 1 } },
  { name: 'CISD 7o 3α3β', spec: { nOrbitals: 7, nAlpha: 3, nBeta: 3, maxExcitation: 2 } },
  { name: 'CISDT 7o 3α2β', spec: { nOrbitals: 7, nAlpha: 3, nBeta: 2, maxExcitation: 3 } },
  { name: 'CISDTQ 7o 3α3β', spec: { nOrbitals: 7, nAlpha: 3, nBeta: 3, maxExcitation: 4 } },
  {
    name: 'RAS 7o 3α3β',
    spec: { nOrbitals: 7, nAlpha: 3, nBeta: 3, maxExcitation: null, ras: { ras1: [0, 1], ras3: [5, 6], maxHoles: 2, maxParticles: 1 } },
  },
  {
    name: 'RAS+CISD 7o 3α2β',
    spec: { nOrbitals: 7, nAlpha: 3, nBeta: 2, maxExcitation: 2, ras: { ras1: [0], ras3: [6], maxHoles: 1, maxParticles: 2 } },
  },
  { name: 'irrep 6o 2α2β', spec: { nOrbitals: 6, nAlpha: 2, nBeta: 2, maxExcitation: null, targetIrrep: 1 }, irreps: [0, 1, 0, 1, 2, 3] },
  { name: 'irrep CISD 7o 3α2β', spec: { nOrbitals: 7, nAlpha: 3, nBeta: 2, maxExcitation: 2, targetIrrep: 2 }, irreps: [0, 0, 2, 1, 3, 2, 0] },
];
