/**
 * A throw-away database on the test MariaDB for one test file, so migration round trips and
 * seed re-runs never disturb ketbook_test, which the API and browser tests share.
 */
import { randomBytes } from 'node:crypto';
import type { Sequelize } from 'sequelize';
import { readSettings } from '../../../db/config';
import { createSequelize } from '../../../db/connection';

export interface ScratchDatabase {
  name: string;
  sequelize: Sequelize;
  drop(): Promise<void>;
}

export async function createScratchDatabase(): Promise<ScratchDatabase> {
  const settings = readSettings().database;
  // The application user may create and drop databases whose names start with "ketbook".
  const name = `ketbook_scratch_${randomBytes(4).toString('hex')}`;
  const admin = createSequelize(settings);
  await admin.query(`CREATE DATABASE \`${name}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`);
  const sequelize = createSequelize({ ...settings, name });
  return {
    name,
    sequelize,
    async drop() {
      await sequelize.close();
      await admin.query(`DROP DATABASE IF EXISTS \`${name}\``);
      await admin.close();
    },
  };
}

/** Rows of a plain SELECT. */
export async function select<T>(sequelize: Sequelize, sql: string, replacements: unknown[] = []): Promise<T[]> {
  const [rows] = await sequelize.query(sql, { replacements });
  return rows as T[];
}
