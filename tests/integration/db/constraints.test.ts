import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { UniqueConstraintError } from 'sequelize';
import { initModels, type Models } from '../../../models';
import { hashPassword } from '../../../db/passwords';
import { createMigrator } from '../../../db/umzug';
import { createScratchDatabase, type ScratchDatabase } from './scratchDatabase';

// The rules checked here are the foundation's schema conventions: e-mail unique (stored
// lower-case), memberships cascade with their workspace and user, creators are set to NULL.
let scratch: ScratchDatabase;
let models: Models;
let passwordHash: string;

beforeAll(async () => {
  scratch = await createScratchDatabase();
  await createMigrator(scratch.sequelize).up();
  models = initModels(scratch.sequelize);
  passwordHash = await hashPassword('constraint-test-password');
});
afterAll(async () => {
  await scratch?.drop();
});

describe('schema constraints', () => {
  it('refuses a second account with the same e-mail, whatever its case', async () => {
    const { User } = models;
    const first = await User.create({ email: 'Quinn.Adeyemi@Example.test', displayName: 'Quinn', passwordHash });
    expect(first.email).toBe('quinn.adeyemi@example.test');
    await expect(
      User.create({ email: 'quinn.adeyemi@EXAMPLE.test', displayName: 'Quinn again', passwordHash }),
    ).rejects.toBeInstanceOf(UniqueConstraintError);
    // A raw insert that skips the model's lower-casing is still caught by the collation.
    await expect(
      scratch.sequelize.query(
        "INSERT INTO users (email, display_name, password_hash) VALUES ('QUINN.ADEYEMI@example.test', 'Raw', 'x')",
      ),
    ).rejects.toBeInstanceOf(UniqueConstraintError);
    expect(await User.count({ where: { email: 'quinn.adeyemi@example.test' } })).toBe(1);
    await first.destroy();
    expect(await User.count()).toBe(0);
  });

  it('deletes memberships with their workspace and with their user; creators become NULL', async () => {
    const { User, Workspace, Membership, Project } = models;
    const owner = await User.create({ email: 'owner@example.test', displayName: 'Owner', passwordHash });
    const member = await User.create({ email: 'member@example.test', displayName: 'Member', passwordHash });
    const first = await Workspace.create({ name: 'First', slug: 'first-cascade', createdBy: owner.id });
    const second = await Workspace.create({ name: 'Second', slug: 'second-cascade', createdBy: owner.id });
    await Membership.bulkCreate([
      { workspaceId: first.id, userId: owner.id, role: 'owner' },
      { workspaceId: first.id, userId: member.id, role: 'viewer' },
      { workspaceId: second.id, userId: owner.id, role: 'owner' },
      { workspaceId: second.id, userId: member.id, role: 'editor' },
    ]);
    await Project.create({ workspaceId: first.id, name: 'Doomed', createdBy: owner.id });
    await Project.create({ workspaceId: second.id, name: 'Kept', createdBy: owner.id });

    await first.destroy();
    expect(await Membership.count({ where: { workspaceId: first.id } })).toBe(0);
    expect(await Project.count({ where: { workspaceId: first.id } })).toBe(0);
    expect(await Membership.count({ where: { workspaceId: second.id } })).toBe(2);

    await member.destroy();
    expect(await Membership.count({ where: { userId: member.id } })).toBe(0);
    expect(await Membership.count({ where: { workspaceId: second.id } })).toBe(1);

    await owner.destroy();
    await second.reload();
    expect(second.createdBy).toBeNull();
    const kept = await Project.findOne({ where: { name: 'Kept' } });
    expect(kept?.createdBy).toBeNull();
    expect(await Membership.count()).toBe(0);

    await second.destroy();
    expect(await Workspace.count()).toBe(0);
    expect(await Project.count()).toBe(0);
  });

  it('refuses a second membership of the same person in the same workspace', async () => {
    const { User, Workspace, Membership } = models;
    const user = await User.create({ email: 'twice@example.test', displayName: 'Twice', passwordHash });
    const workspace = await Workspace.create({ name: 'Twice', slug: 'twice', createdBy: user.id });
    await Membership.create({ workspaceId: workspace.id, userId: user.id, role: 'owner' });
    await expect(Membership.create({ workspaceId: workspace.id, userId: user.id, role: 'viewer' })).rejects.toBeInstanceOf(
      UniqueConstraintError,
    );
    await workspace.destroy();
    await user.destroy();
    expect(await Membership.count()).toBe(0);
  });

  it('stores an audit entry with JSON detail and a BIGINT id, and reads the detail back', async () => {
    const { AuditEntry } = models;
    const entry = await AuditEntry.create({ actorId: null, action: 'user.sign-in-failed', detail: { reason: 'bad password', n: 2 } });
    const read = await AuditEntry.findByPk(entry.id);
    const detail = typeof read!.detail === 'string' ? JSON.parse(read!.detail) : read!.detail;
    expect(detail).toEqual({ reason: 'bad password', n: 2 });
    expect(Number(read!.id)).toBe(Number(entry.id));
    expect(read!.createdAt).toBeInstanceOf(Date);
    await AuditEntry.destroy({ where: { id: entry.id } });
    expect(await AuditEntry.count()).toBe(0);
  });
});
