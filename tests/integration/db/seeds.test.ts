import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { initModels, type Models } from '../../../models';
import { verifyPassword } from '../../../db/passwords';
import { DEMO_PEOPLE, DEMO_RUNS, DEMO_WORKSPACES } from '../../../db/seeds/demoScenario';
import { createMigrator, createSeeder, SEEDER_META_TABLE } from '../../../db/umzug';
import { createScratchDatabase, type ScratchDatabase } from './scratchDatabase';

let scratch: ScratchDatabase;
let models: Models;

beforeAll(async () => {
  scratch = await createScratchDatabase();
  await createMigrator(scratch.sequelize).up();
  models = initModels(scratch.sequelize);
});
afterAll(async () => {
  await scratch?.drop();
});

async function counts() {
  const { User, Workspace, Membership, Project, Run } = models;
  return {
    users: await User.count(),
    workspaces: await Workspace.count(),
    memberships: await Membership.count(),
    projects: await Project.count(),
    runs: await Run.count(),
  };
}

// Expected rows follow from the demo scenario's own lists (db/seeds/demoScenario.ts).
const expected = {
  users: DEMO_PEOPLE.length,
  workspaces: DEMO_WORKSPACES.length,
  memberships: DEMO_PEOPLE.reduce((n, p) => n + Object.keys(p.memberships).length, 0),
  projects: DEMO_WORKSPACES.reduce((n, w) => n + w.projects.length, 0),
  runs: DEMO_RUNS.length,
};

describe('demo seed', () => {
  it('inserts the scenario: four people, two workspaces, their roles and projects', async () => {
    const applied = await createSeeder(scratch.sequelize).up();
    expect(applied.map((s) => s.name)).toEqual(['2026.12.01T11.00.00.demo-scenario', '2026.12.02T09.00.00.demo-runs']);
    expect(await counts()).toEqual(expected);
    expect(expected).toEqual({ users: 4, workspaces: 2, memberships: 4, projects: 2, runs: 5 });

    const { User, Workspace, Membership, Project } = models;
    const larkspur = await Workspace.findOne({ where: { slug: 'larkspur' } });
    expect(larkspur?.name).toBe('Larkspur Correlation Group');
    const roles = await Membership.findAll({ where: { workspaceId: larkspur!.id } });
    const users = await User.findAll({ where: { id: roles.map((m) => m.userId) } });
    const emailById = new Map(users.map((u) => [u.id, u.email]));
    expect(Object.fromEntries(roles.map((m) => [emailById.get(m.userId), m.role]))).toEqual({
      'ines@larkspur.example': 'owner',
      'tomasz@larkspur.example': 'editor',
      'mei@larkspur.example': 'viewer',
    });
    const projects = await Project.findAll({ where: { workspaceId: larkspur!.id }, order: [['name', 'ASC']] });
    expect(projects.map((p) => p.name)).toEqual(['H2 dissociation benchmarks', 'Hubbard ring studies']);

    // The demo runs hold computed numbers, not typed-in ones. H2 STO-3G at 1.4 bohr:
    // Szabo & Ostlund, Modern Quantum Chemistry, RHF −1.1167 Eh (§3.5.2) and FCI −1.1373 Eh (§4.2).
    const h2 = await models.Run.findOne({ where: { title: 'H2 near equilibrium (1.4 bohr), full CI' } });
    expect(Math.abs(h2!.referenceEnergy! - -1.1167)).toBeLessThan(1e-4);
    expect(Math.abs(h2!.lowestEnergy! - -1.1373)).toBeLessThan(1e-4);
    expect(h2!.ciVectorBytes).toBeGreaterThan(0);
    expect(JSON.parse(h2!.result).provenance.runFileHash).toBe(h2!.runFileHash);

    const admin = await User.findOne({ where: { email: 'admin@ketbook.example' } });
    expect(admin?.siteRole).toBe('admin');
    // bcrypt modular-crypt form with cost 10 (Provos & Mazières 1999; common practice, no source for the prefix).
    expect(admin!.passwordHash).toMatch(/^\$2[aby]\$10\$/);
    expect(await verifyPassword('ketbook-admin-demo', admin!.passwordHash)).toBe(true);
    expect(await verifyPassword('larkspur-demo-1', admin!.passwordHash)).toBe(false);
  });

  it('is idempotent: a second run, and a run after its meta row is lost, change nothing', async () => {
    const before = await counts();
    expect(await createSeeder(scratch.sequelize).up()).toEqual([]);
    expect(await counts()).toEqual(before);

    await scratch.sequelize.query(`DELETE FROM ${SEEDER_META_TABLE}`);
    const reapplied = await createSeeder(scratch.sequelize).up();
    expect(reapplied.length).toBe(2);
    expect(await counts()).toEqual(before);
  });

  it('down removes the scenario again', async () => {
    await createSeeder(scratch.sequelize).down({ to: 0 });
    expect(await counts()).toEqual({ users: 0, workspaces: 0, memberships: 0, projects: 0, runs: 0 });
  });
});
