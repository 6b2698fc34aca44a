/** The seeded site admin. The password comes from the demo seed, so it is written in one place only. */
export function demoAdmin(): { email: string; password: string } {
  const password = process.env.KETBOOK_DEMO_ADMIN_PASSWORD;
  if (!password) throw new Error('KETBOOK_DEMO_ADMIN_PASSWORD is not set');
  return { email: 'admin@ketbook.example', password };
}
