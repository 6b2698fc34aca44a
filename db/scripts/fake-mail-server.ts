/**
 * Runs the local fake SMTP server on 127.0.0.1:KETBOOK_SMTP_PORT until SIGTERM/SIGINT.
 *   npx tsx db/scripts/fake-mail-server.ts
 */
import { closeSequelize, getSequelize } from '../connection';
import { readSettings } from '../config';
import { startFakeMailServer } from '../outbox/fakeMailServer';

async function main(): Promise<void> {
  const { smtpHost, smtpPort, database } = readSettings();
  let server;
  try {
    server = await startFakeMailServer({
      sequelize: getSequelize(),
      host: smtpHost,
      port: smtpPort,
      onStored: ({ id, to, subject }) => console.log(`fake-mail-server: #${id} to ${to}: ${JSON.stringify(subject)}`),
    });
  } catch (error) {
    const code = (error as NodeJS.ErrnoException).code;
    console.error(
      code === 'EADDRINUSE'
        ? `fake-mail-server: port ${smtpPort} is already in use (another mail server running?)`
        : `fake-mail-server: ${(error as Error).message}`,
    );
    await closeSequelize().catch(() => undefined);
    process.exit(1);
  }
  console.log(`fake-mail-server: listening on ${smtpHost}:${server.port}, storing into ${database.name}.mail_outbox`);
  let stopping = false;
  const stop = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    console.log(`fake-mail-server: ${signal}, stopping`);
    await server.close();
    await closeSequelize().catch(() => undefined);
    process.exit(0);
  };
  process.on('SIGTERM', () => void stop('SIGTERM'));
  process.on('SIGINT', () => void stop('SIGINT'));
}

void main();
