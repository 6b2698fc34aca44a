import { RUN_FILE_FORMAT, type RunFileInput } from '../../solver/runFile/schema';

/**
 * Ketbook's own starter systems for the run builder. Each is a complete run file, so choosing
 * one fills the whole form and what the page runs is exactly what the file says. Geometries
 * are stated in each description; the numbers are chosen to be near-equilibrium or to show
 * one effect clearly, not to reproduce any particular table.
 */
export interface RunPreset {
  id: string;
  label: string;
  description: string;
  runFile: RunFileInput;
}

type AtomRow = [string, number, number, number];

function molecule(
  title: string,
  atoms: AtomRow[],
  options: { charge?: number; multiplicity?: number; units?: 'bohr' | 'angstrom'; zeta?: Record<string, number> } = {},
): RunFileInput {
  return {
    format: RUN_FILE_FORMAT,
    title,
    system: {
      type: 'molecule',
      units: options.units ?? 'bohr',
      atoms,
      charge: options.charge ?? 0,
      multiplicity: options.multiplicity ?? 1,
      basis: 'STO-3G',
      ...(options.zeta ? { zeta: options.zeta } : {}),
    },
    reference: (options.multiplicity ?? 1) === 1 ? 'RHF' : 'ROHF',
    ci: { space: 'FCI', frozenCore: 0, deletedVirtuals: 0, roots: 1 },
  };
}

/** A straight chain of n hydrogens along z, `spacingBohr` apart. */
function hydrogenChain(n: number, spacingBohr: number): AtomRow[] {
  return Array.from({ length: n }, (_, i) => ['H', 0, 0, i * spacingBohr] as AtomRow);
}

/** Equilateral triangle in the xy plane with side `sideBohr` (circumradius side/√3). */
function triangle(sideBohr: number): AtomRow[] {
  const r = sideBohr / Math.sqrt(3);
  return [0, 1, 2].map((k) => {
    const angle = (2 * Math.PI * k) / 3;
    return ['H', r * Math.cos(angle), r * Math.sin(angle), 0] as AtomRow;
  });
}

/** Water: O at the origin, the two H in the xz plane, R(OH) in Å and the HOH angle in degrees. */
function water(rOhAngstrom: number, angleDegrees: number): AtomRow[] {
  const half = ((angleDegrees / 2) * Math.PI) / 180;
  return [
    ['O', 0, 0, 0],
    ['H', rOhAngstrom * Math.sin(half), 0, rOhAngstrom * Math.cos(half)],
    ['H', -rOhAngstrom * Math.sin(half), 0, rOhAngstrom * Math.cos(half)],
  ];
}

export const RUN_PRESETS: readonly RunPreset[] = [
  {
    id: 'h2',
    label: 'H₂, 1.4 bohr',
    description: 'Hydrogen molecule near its equilibrium bond length, R = 1.4 bohr.',
    runFile: molecule('H2 at 1.4 bohr', [['H', 0, 0, 0], ['H', 0, 0, 1.4]]),
  },
  {
    id: 'heh-plus',
    label: 'HeH⁺, 1.4632 bohr',
    description: 'Helium hydride cation, R = 1.4632 bohr, with Slater exponents ζ(He) = 2.0925 and ζ(H) = 1.24.',
    runFile: molecule('HeH+ at 1.4632 bohr', [['He', 0, 0, 0], ['H', 0, 0, 1.4632]], { charge: 1, zeta: { He: 2.0925, H: 1.24 } }),
  },
  {
    id: 'h3-plus',
    label: 'H₃⁺ triangle',
    description: 'Trihydrogen cation as an equilateral triangle with side 1.65 bohr (close to its equilibrium).',
    runFile: molecule('H3+ triangle, side 1.65 bohr', triangle(1.65), { charge: 1 }),
  },
  {
    id: 'h4-square',
    label: 'H₄ square',
    description: 'Four hydrogens on a square of side 2.0 bohr: a strongly correlated, nearly degenerate case.',
    runFile: molecule('H4 square, side 2.0 bohr', [['H', 0, 0, 0], ['H', 2, 0, 0], ['H', 2, 2, 0], ['H', 0, 2, 0]]),
  },
  {
    id: 'h4-chain',
    label: 'H₄ chain',
    description: 'Four hydrogens in a line, 1.8 bohr apart.',
    runFile: molecule('H4 chain, spacing 1.8 bohr', hydrogenChain(4, 1.8)),
  },
  {
    id: 'lih',
    label: 'LiH, 3.015 bohr',
    description: 'Lithium hydride near its equilibrium bond length, R = 3.015 bohr.',
    runFile: molecule('LiH at 3.015 bohr', [['Li', 0, 0, 0], ['H', 0, 0, 3.015]]),
  },
  {
    id: 'he2',
    label: 'He₂, 5.6 bohr',
    description: 'Two helium atoms 5.6 bohr apart, near the van der Waals minimum (which a minimal basis cannot bind).',
    runFile: molecule('He2 at 5.6 bohr', [['He', 0, 0, 0], ['He', 0, 0, 5.6]]),
  },
  {
    id: 'be',
    label: 'Be atom',
    description: 'The beryllium atom, whose 2s–2p near-degeneracy makes the reference weight visibly smaller than 1.',
    runFile: molecule('Be atom', [['Be', 0, 0, 0]]),
  },
  {
    id: 'h2o',
    label: 'H₂O',
    description: 'Water at a near-equilibrium geometry: R(OH) = 0.9572 Å, angle HOH = 104.52°.',
    runFile: molecule('H2O near equilibrium', water(0.9572, 104.52), { units: 'angstrom' }),
  },
  {
    id: 'two-h2',
    label: '2 × H₂, 10 bohr apart',
    description: 'Two H₂ molecules (R = 1.4 bohr each), side by side 10 bohr apart: compare CISD with FCI to see size consistency.',
    runFile: molecule('Two H2 10 bohr apart', [['H', 0, 0, 0], ['H', 0, 0, 1.4], ['H', 10, 0, 0], ['H', 10, 0, 1.4]]),
  },
  {
    id: 'h10-chain',
    label: 'H₁₀ chain (heavy)',
    description: 'Ten hydrogens in a line, 1.8 bohr apart: full CI over 63 504 determinants, the heaviest starter.',
    runFile: molecule('H10 chain, spacing 1.8 bohr', hydrogenChain(10, 1.8)),
  },
];

export function presetById(id: string): RunPreset | undefined {
  return RUN_PRESETS.find((p) => p.id === id);
}

/** A Hubbard chain at half filling: the starting point of the lattice form. */
export function defaultHubbardRunFile(): RunFileInput {
  return {
    format: RUN_FILE_FORMAT,
    title: 'Hubbard chain, 6 sites',
    system: { type: 'hubbard', sites: 6, periodic: false, t: 1, U: 4, electrons: 6, multiplicity: 1 },
    ci: { space: 'FCI', frozenCore: 0, deletedVirtuals: 0, roots: 1 },
  };
}
