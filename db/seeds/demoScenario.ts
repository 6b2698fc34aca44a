/**
 * The invented demo scenario: people, groups and projects. No real people; the passwords are
 * for the local demo only and are printed by `npm start`.
 */
import type { SiteRole, WorkspaceRole } from '../../models';

export interface DemoPerson {
  email: string;
  displayName: string;
  password: string;
  siteRole: SiteRole;
  /** Workspace slug → role. */
  memberships: Record<string, WorkspaceRole>;
}

export interface DemoWorkspace {
  slug: string;
  name: string;
  description: string;
  createdByEmail: string;
  projects: { name: string; description: string }[];
}

export const DEMO_PEOPLE: DemoPerson[] = [
  {
    email: 'admin@ketbook.example',
    displayName: 'Aurelio Banks',
    password: 'ketbook-admin-demo',
    siteRole: 'admin',
    memberships: { quillon: 'owner' },
  },
  {
    email: 'ines@larkspur.example',
    displayName: 'Dr. Ines Okafor-Lindqvist',
    password: 'larkspur-demo-1',
    siteRole: 'member',
    memberships: { larkspur: 'owner' },
  },
  {
    email: 'tomasz@larkspur.example',
    displayName: 'Tomasz Reyes',
    password: 'larkspur-demo-2',
    siteRole: 'member',
    memberships: { larkspur: 'editor' },
  },
  {
    email: 'mei@larkspur.example',
    displayName: 'Mei Hartono',
    password: 'larkspur-demo-3',
    siteRole: 'member',
    memberships: { larkspur: 'viewer' },
  },
];

export const DEMO_WORKSPACES: DemoWorkspace[] = [
  {
    slug: 'larkspur',
    name: 'Larkspur Correlation Group',
    description:
      'Electron correlation in small molecules and model lattices, Halvard Institute for Molecular Physics.',
    createdByEmail: 'ines@larkspur.example',
    projects: [
      { name: 'H2 dissociation benchmarks', description: 'RHF, UHF and full CI along the H–H stretch in minimal bases.' },
      { name: 'Hubbard ring studies', description: 'Half-filled Hubbard rings across U/t, exact diagonalisation.' },
    ],
  },
  {
    slug: 'quillon',
    name: 'Quillon Methods Lab',
    description: 'Method development and cross-checks.',
    createdByEmail: 'admin@ketbook.example',
    projects: [],
  },
];

/**
 * The group's saved runs. Only the inputs are written here; the seed computes every number
 * with Ketbook's own solver, so the demo shows real results, never invented ones.
 */
export interface DemoRun {
  workspace: string;
  project: string | null;
  title: string;
  tags: string[];
  savedByEmail: string;
  runFile: Record<string, unknown>;
}

const h2At = (distanceBohr: number) => ({
  type: 'molecule',
  units: 'bohr',
  atoms: [
    ['H', 0, 0, 0],
    ['H', 0, 0, distanceBohr],
  ],
  basis: 'STO-3G',
});

export const DEMO_RUNS: DemoRun[] = [
  {
    workspace: 'larkspur',
    project: 'H2 dissociation benchmarks',
    title: 'H2 near equilibrium (1.4 bohr), full CI',
    tags: ['equilibrium', 'reference'],
    savedByEmail: 'tomasz@larkspur.example',
    runFile: { format: 'ketbook-run/1', title: 'H2 at 1.4 bohr', system: h2At(1.4), reference: 'RHF', ci: { space: 'FCI', roots: 2 } },
  },
  {
    workspace: 'larkspur',
    project: 'H2 dissociation benchmarks',
    title: 'H2 stretched to 4.0 bohr, full CI',
    tags: ['stretched'],
    savedByEmail: 'tomasz@larkspur.example',
    runFile: { format: 'ketbook-run/1', title: 'H2 at 4.0 bohr', system: h2At(4.0), reference: 'RHF', ci: { space: 'FCI', roots: 2 } },
  },
  {
    workspace: 'larkspur',
    project: 'H2 dissociation benchmarks',
    title: 'H2 stretched to 4.0 bohr, RHF only',
    tags: ['stretched'],
    savedByEmail: 'ines@larkspur.example',
    runFile: { format: 'ketbook-run/1', title: 'H2 at 4.0 bohr, RHF', system: h2At(4.0), reference: 'RHF' },
  },
  {
    workspace: 'larkspur',
    project: null,
    title: 'LiH, CISD with a frozen 1s core',
    tags: ['truncated'],
    savedByEmail: 'ines@larkspur.example',
    runFile: {
      format: 'ketbook-run/1',
      title: 'LiH CISD fc1',
      system: { type: 'molecule', units: 'angstrom', atoms: [['Li', 0, 0, 0], ['H', 0, 0, 1.6]], basis: 'STO-3G' },
      reference: 'RHF',
      ci: { space: 'CISD', frozenCore: 1 },
    },
  },
  {
    workspace: 'larkspur',
    project: 'Hubbard ring studies',
    title: 'Six-site ring at half filling, U/t = 4',
    tags: ['half filling'],
    savedByEmail: 'tomasz@larkspur.example',
    runFile: {
      format: 'ketbook-run/1',
      title: 'Hubbard ring N=6 U/t=4',
      system: { type: 'hubbard', sites: 6, periodic: true, t: 1, U: 4, electrons: 6 },
      ci: { space: 'FCI', roots: 3 },
    },
  },
];
