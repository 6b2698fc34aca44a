import { DataTypes, Sequelize } from 'sequelize';
import type { Migration } from '../umzug';
import { tableOptions } from './tableOptions';

export const up: Migration = async ({ context: queryInterface }) => {
  await queryInterface.createTable(
    'audit_log',
    {
      // BIGINT: one row per sign-in and change, for the life of the site.
      id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
      // Entries stay when the actor or workspace goes: the log is the record of what happened.
      actor_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: true,
        references: { model: 'users', key: 'id' },
        onDelete: 'SET NULL',
        onUpdate: 'CASCADE',
      },
      action: { type: DataTypes.STRING(64), allowNull: false },
      workspace_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: true,
        references: { model: 'workspaces', key: 'id' },
        onDelete: 'SET NULL',
        onUpdate: 'CASCADE',
      },
      target_type: { type: DataTypes.STRING(40), allowNull: true },
      target_id: { type: DataTypes.STRING(64), allowNull: true },
      client_address: { type: DataTypes.STRING(64), allowNull: true },
      // MariaDB's JSON is LONGTEXT with a json_valid check.
      detail: { type: DataTypes.JSON, allowNull: true },
      created_at: { type: DataTypes.DATE(3), allowNull: false, defaultValue: Sequelize.literal('CURRENT_TIMESTAMP(3)') },
    },
    tableOptions,
  );
  await queryInterface.addIndex('audit_log', ['workspace_id', 'created_at'], { name: 'audit_log_workspace_created' });
  await queryInterface.addIndex('audit_log', ['actor_id'], { name: 'audit_log_actor_id' });
};

export const down: Migration = async ({ context: queryInterface }) => {
  await queryInterface.dropTable('audit_log');
};
