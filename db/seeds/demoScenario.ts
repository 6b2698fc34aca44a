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
