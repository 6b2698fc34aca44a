/**
 * The migrator and the seeder (umzug). Both take their steps from explicit lists rather than
 * a glob, so they run the same under tsx, vitest and a bundler; each keeps its own meta table.
 */
import { Umzug, SequelizeStorage, type MigrationFn } from 'umzug';
import { DataTypes, type QueryInterface, type Sequelize } from 'sequelize';
import { migrations } from './migrations';
import { seeds } from './seeds';

export type Migration = MigrationFn<QueryInterface>;
export type Seed = MigrationFn<Sequelize>;
export interface Step<Ctx> { name: string; up: MigrationFn<Ctx>; down: MigrationFn<Ctx> }

export const MIGRATION_META_TABLE = 'migration_meta';
export const SEEDER_META_TABLE = 'seeder_meta';

// The storage's own default table is utf8 (3-byte); define it here so every table is utf8mb4.
function metaStorage(sequelize: Sequelize, tableName: string) {
  const model =
    sequelize.isDefined(tableName)
      ? sequelize.model(tableName)
      : sequelize.define(tableName, { name: { type: DataTypes.STRING(190), allowNull: false, primaryKey: true } }, {
          tableName,
          timestamps: false,
          charset: 'utf8mb4',
          collate: 'utf8mb4_unicode_ci',
        });
  return new SequelizeStorage({ model });
}

export function createMigrator(sequelize: Sequelize, logger: Console | undefined = undefined) {
  return new Umzug({
    migrations,
    context: sequelize.getQueryInterface(),
    storage: metaStorage(sequelize, MIGRATION_META_TABLE),
    logger,
  });
}

export function createSeeder(sequelize: Sequelize, logger: Console | undefined = undefined) {
  return new Umzug({ migrations: seeds, context: sequelize, storage: metaStorage(sequelize, SEEDER_META_TABLE), logger });
}
