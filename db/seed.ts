/**
 * Seed command line:
 *   npx tsx db/seed.ts                 apply pending seeds (a second run changes nothing)
 *   npx tsx db/seed.ts down            revert the last seed
 *   npx tsx db/seed.ts sign-ins        print the demo sign-ins (for `npm start`)
 */
import { closeSequelize, getSequelize } from './connection';
import { DEMO_PEOPLE } from './seeds/demoScenario';
import { createSeeder } from './umzug';

function printSignIns(): void {
  const width = Math.max(...DEMO_PEOPLE.map((p) => p.email.length));
  for (const person of DEMO_PEOPLE) {
    const roles = [
      person.siteRole === 'admin' ? 'site admin' : null,
      ...Object.entries(person.memberships).map(([slug, role]) => `${role} of ${slug}`),
    ].filter(Boolean);
    console.log(`  ${person.email.padEnd(width)}  ${person.password.padEnd(20)}  ${person.displayName} (${roles.join(', ')})`);
  }
}

async function main(argv: string[]): Promise<number> {
  const [command = 'up'] = argv;
  if (command === 'sign-ins') {
    printSignIns();
    return 0;
  }
  const seeder = createSeeder(getSequelize());
  if (command === 'up') {
    const applied = await seeder.up();
    console.log(applied.length ? `seeds applied: ${applied.map((s) => s.name).join(', ')}` : 'seeds: up to date');
  } else if (command === 'down') {
    const reverted = await seeder.down();
    console.log(`seeds reverted: ${reverted.map((s) => s.name).join(', ') || 'none'}`);
  } else {
    console.error('usage: tsx db/seed.ts [up | down | sign-ins]');
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
    console.error(`seed: ${error instanceof Error ? error.message : String(error)}`);
    await closeSequelize().catch(() => undefined);
    process.exitCode = 1;
  });
