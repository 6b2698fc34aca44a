import { DEMO_PEOPLE } from '../../db/seeds/demoScenario';

/** The seeded site admin, read from the demo seed so the password is written in one place only. */
export function demoAdmin(): { email: string; password: string } {
  const admin = DEMO_PEOPLE.find((p) => p.siteRole === 'admin');
  if (!admin) throw new Error('the demo seed has no site admin');
  return { email: admin.email, password: admin.password };
}
