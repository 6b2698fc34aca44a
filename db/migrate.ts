/**
 * Migration command line:
 *   npx tsx db/migrate.ts up       apply all pending migrations
 *   npx tsx db/migrate.ts down     revert the last one (`down --all` reverts every one)
 *   npx tsx db/migrate.ts status   list applied and pending
 * Connection settings come from the KETBOOK_DB_* variables (see db/config.ts).
 */
import { closeSequelize, getSequelize } from './connection';
import { createMigrator, SEEDER_META_TABLE } from './umzug';

async function main(argv: string[]): Promise<number> {
  const [command = 'up', flag] = argv;
  const migrator = createMigrator(getSequelize());
  if (command === 'up') {
    const applied = await migrator.up();
    console.log(applied.length ? `migrations applied: ${applied.map((m) => m.name).join(', ')}` : 'migrations: up to date');
  } else if (command === 'down') {
    const reverted = await migrator.down(flag === '--all' ? { to: 0 } : undefined);
    // With every table gone, the record of applied seeds would be a lie; the next seed run starts afresh.
    if (flag === '--all') await getSequelize().getQueryInterface().dropTable(SEEDER_META_TABLE);
    console.log(`migrations reverted: ${reverted.map((m) => m.name).join(', ') || 'none'}`);
  } else if (command === 'status') {
    const executed = await migrator.executed();
    const pending = await migrator.pending();
    for (const m of executed) console.log(`applied  ${m.name}`);
    for (const m of pending) console.log(`pending  ${m.name}`);
  } else {
    console.error('usage: tsx db/migrate.ts up | down [--all] | status');
    return 2;
  }
  return 0;
}

main(process.argv.slice(2))
  .then(async (code) => {
    await closeSequelize();
    process.exitCode = code;
  })
  .catch(async (error: unknown) => {
    console.error(`migrate: ${error instanceof Error ? error.message : String(error)}`);
    await closeSequelize().catch(() => undefined);
    process.exitCode = 1;
  });
