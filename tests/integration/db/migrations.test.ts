import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createMigrator } from '../../../db/umzug';
import { migrations } from '../../../db/migrations';
import { createScratchDatabase, select, type ScratchDatabase } from './scratchDatabase';

// The table list, foreign keys and unique keys below are the foundation's schema conventions
// (the project's own design; nothing computed). The checks read MariaDB's information_schema.
const APP_TABLES = [
  'audit_log',
  'invitations',
  'mail_outbox',
  'memberships',
  'password_resets',
  'projects',
  'run_tags',
  'runs',
  'scan_points',
  'scans',
  'sign_in_attempts',
  'users',
  'workspaces',
];

const FOREIGN_KEYS = [
  ['audit_log', 'actor_id', 'users', 'SET NULL'],
  ['audit_log', 'workspace_id', 'workspaces', 'SET NULL'],
  ['invitations', 'accepted_by', 'users', 'SET NULL'],
  ['invitations', 'invited_by', 'users', 'SET NULL'],
  ['invitations', 'workspace_id', 'workspaces', 'CASCADE'],
  ['memberships', 'user_id', 'users', 'CASCADE'],
  ['memberships', 'workspace_id', 'workspaces', 'CASCADE'],
  ['password_resets', 'user_id', 'users', 'CASCADE'],
  ['projects', 'created_by', 'users', 'SET NULL'],
  ['projects', 'workspace_id', 'workspaces', 'CASCADE'],
  ['run_tags', 'run_id', 'runs', 'CASCADE'],
  ['runs', 'created_by', 'users', 'SET NULL'],
  ['runs', 'project_id', 'projects', 'SET NULL'],
  ['runs', 'workspace_id', 'workspaces', 'CASCADE'],
  ['scan_points', 'scan_id', 'scans', 'CASCADE'],
  ['scans', 'created_by', 'users', 'SET NULL'],
  ['scans', 'project_id', 'projects', 'SET NULL'],
  ['scans', 'workspace_id', 'workspaces', 'CASCADE'],
  ['workspaces', 'created_by', 'users', 'SET NULL'],
];

const UNIQUE_KEYS = [
  ['invitations', 'token_hash'],
  ['memberships', 'workspace_id,user_id'],
  ['password_resets', 'token_hash'],
  ['projects', 'workspace_id,name'],
  ['runs', 'public_id'],
  ['scans', 'public_id'],
  ['users', 'email'],
  ['workspaces', 'slug'],
];

let scratch: ScratchDatabase;

beforeAll(async () => {
  scratch = await createScratchDatabase();
});
afterAll(async () => {
  await scratch?.drop();
});

async function tableNames(): Promise<string[]> {
  const rows = await select<{ name: string }>(
    scratch.sequelize,
    'SELECT table_name AS name FROM information_schema.tables WHERE table_schema = ? ORDER BY table_name',
    [scratch.name],
  );
  // Sorted here, not by the server: its collation orders '_' differently from JavaScript.
  return rows.map((r) => r.name).sort();
}

describe('migrations', () => {
  it('up creates every table, all utf8mb4, with the foreign keys and unique keys', async () => {
    const applied = await createMigrator(scratch.sequelize).up();
    expect(applied.length).toBe(migrations.length);
    expect(await tableNames()).toEqual([...APP_TABLES, 'migration_meta'].sort());

    const collations = await select<{ name: string; collation: string }>(
      scratch.sequelize,
      'SELECT table_name AS name, table_collation AS collation FROM information_schema.tables WHERE table_schema = ?',
      [scratch.name],
    );
    for (const row of collations) expect([row.name, row.collation]).toEqual([row.name, 'utf8mb4_unicode_ci']);

    const textColumns = await select<{ t: string; c: string; charset: string }>(
      scratch.sequelize,
      `SELECT table_name AS t, column_name AS c, character_set_name AS charset
         FROM information_schema.columns WHERE table_schema = ? AND character_set_name IS NOT NULL`,
      [scratch.name],
    );
    expect(textColumns.length).toBeGreaterThan(20);
    for (const col of textColumns) expect(`${col.t}.${col.c}:${col.charset}`).toBe(`${col.t}.${col.c}:utf8mb4`);

    const fks = await select<{ t: string; c: string; ref: string; onDelete: string }>(
      scratch.sequelize,
      `SELECT k.table_name AS t, k.column_name AS c, k.referenced_table_name AS ref, r.delete_rule AS onDelete
         FROM information_schema.key_column_usage k
         JOIN information_schema.referential_constraints r
           ON r.constraint_schema = k.constraint_schema AND r.constraint_name = k.constraint_name
        WHERE k.table_schema = ? AND k.referenced_table_name IS NOT NULL
        ORDER BY k.table_name, k.column_name`,
      [scratch.name],
    );
    // Compared in JavaScript order: the server's collation orders '_' differently.
    const byKey = (a: string[], b: string[]) => (a.join(' ') < b.join(' ') ? -1 : 1);
    expect(fks.map((f) => [f.t, f.c, f.ref, f.onDelete]).sort(byKey)).toEqual([...FOREIGN_KEYS].sort(byKey));

    const uniques = await select<{ t: string; cols: string }>(
      scratch.sequelize,
      `SELECT table_name AS t, GROUP_CONCAT(column_name ORDER BY seq_in_index) AS cols
         FROM information_schema.statistics
        WHERE table_schema = ? AND non_unique = 0 AND index_name <> 'PRIMARY' AND table_name <> 'migration_meta'
        GROUP BY table_name, index_name ORDER BY table_name, cols`,
      [scratch.name],
    );
    expect(uniques.map((u) => [u.t, u.cols]).sort(byKey)).toEqual([...UNIQUE_KEYS].sort(byKey));
  });

  it('status lists every migration as applied and none pending', async () => {
    const migrator = createMigrator(scratch.sequelize);
    expect((await migrator.executed()).length).toBe(migrations.length);
    expect(await migrator.pending()).toEqual([]);
  });

  it('down to zero removes every application table, and up brings them back', async () => {
    const migrator = createMigrator(scratch.sequelize);
    const reverted = await migrator.down({ to: 0 });
    expect(reverted.length).toBe(migrations.length);
    expect(await tableNames()).toEqual(['migration_meta']);
    await migrator.up();
    expect(await tableNames()).toEqual([...APP_TABLES, 'migration_meta'].sort());
  });
});
