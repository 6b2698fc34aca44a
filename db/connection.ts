/**
 * The Sequelize connection. One per process: `getSequelize()` creates it on first use,
 * `closeSequelize()` ends it (scripts and tests call it so Node can exit).
 */
import { Sequelize } from 'sequelize';
import * as mariadb from 'mariadb';
import { readSettings, type DatabaseSettings } from './config';
import { applyMariadbRawQueryFix } from './mariadbRawQueryFix';

/** A new connection to the given database; callers own it and must close it. */
export function createSequelize(database: DatabaseSettings = readSettings().database): Sequelize {
  const sequelize = new Sequelize(database.name, database.user, database.password, {
    dialect: 'mariadb',
    // Handing the driver over explicitly keeps Sequelize from a dynamic require bundlers cannot follow.
    dialectModule: mariadb,
    host: database.host,
    port: database.port,
    logging: false,
    // Store and read every DATETIME as UTC, whatever the machine's zone.
    timezone: '+00:00',
    dialectOptions: { connectTimeout: 5_000 },
    pool: { max: 5, min: 0, idle: 10_000, acquire: 10_000 },
    define: { underscored: true, charset: 'utf8mb4', collate: 'utf8mb4_unicode_ci' },
  });
  applyMariadbRawQueryFix(sequelize);
  return sequelize;
}

// Kept on globalThis so `next dev` reloads reuse the pool instead of opening a new one each time.
const holder = globalThis as typeof globalThis & { __ketbookSequelize?: Sequelize };

export function getSequelize(): Sequelize {
  if (!holder.__ketbookSequelize) holder.__ketbookSequelize = createSequelize();
  return holder.__ketbookSequelize;
}

export async function closeSequelize(): Promise<void> {
  const sequelize = holder.__ketbookSequelize;
  holder.__ketbookSequelize = undefined;
  if (sequelize) await sequelize.close();
}
