import { DataTypes, Sequelize } from 'sequelize';
import type { Migration } from '../umzug';
import { tableOptions } from './tableOptions';

export const up: Migration = async ({ context: queryInterface }) => {
  await queryInterface.createTable(
    'users',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      // Stored lower-case by the application, so a plain unique index makes e-mail case-insensitive.
      email: { type: DataTypes.STRING(254), allowNull: false },
      display_name: { type: DataTypes.STRING(100), allowNull: false },
      password_hash: { type: DataTypes.STRING(100), allowNull: false },
      site_role: { type: DataTypes.ENUM('admin', 'member'), allowNull: false, defaultValue: 'member' },
      created_at: { type: DataTypes.DATE(3), allowNull: false, defaultValue: Sequelize.literal('CURRENT_TIMESTAMP(3)') },
      updated_at: { type: DataTypes.DATE(3), allowNull: false, defaultValue: Sequelize.literal('CURRENT_TIMESTAMP(3)') },
    },
    tableOptions,
  );
  // A named unique index (createTable ignores a named `unique` on a column).
  await queryInterface.addIndex('users', ['email'], { unique: true, name: 'users_email_unique' });
};

export const down: Migration = async ({ context: queryInterface }) => {
  await queryInterface.dropTable('users');
};
