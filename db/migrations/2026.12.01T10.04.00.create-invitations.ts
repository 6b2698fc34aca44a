import { DataTypes, Sequelize } from 'sequelize';
import type { Migration } from '../umzug';
import { tableOptions } from './tableOptions';

export const up: Migration = async ({ context: queryInterface }) => {
  await queryInterface.createTable(
    'invitations',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      workspace_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'workspaces', key: 'id' },
        onDelete: 'CASCADE',
        onUpdate: 'CASCADE',
      },
      email: { type: DataTypes.STRING(254), allowNull: false },
      role: { type: DataTypes.ENUM('owner', 'editor', 'viewer'), allowNull: false },
      // Only the SHA-256 of the token from the link is kept, so a database leak opens no invitation.
      token_hash: { type: DataTypes.CHAR(64), allowNull: false },
      invited_by: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: true,
        references: { model: 'users', key: 'id' },
        onDelete: 'SET NULL',
        onUpdate: 'CASCADE',
      },
      expires_at: { type: DataTypes.DATE(3), allowNull: false },
      accepted_at: { type: DataTypes.DATE(3), allowNull: true },
      accepted_by: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: true,
        references: { model: 'users', key: 'id' },
        onDelete: 'SET NULL',
        onUpdate: 'CASCADE',
      },
      revoked_at: { type: DataTypes.DATE(3), allowNull: true },
      created_at: { type: DataTypes.DATE(3), allowNull: false, defaultValue: Sequelize.literal('CURRENT_TIMESTAMP(3)') },
      updated_at: { type: DataTypes.DATE(3), allowNull: false, defaultValue: Sequelize.literal('CURRENT_TIMESTAMP(3)') },
    },
    tableOptions,
  );
  // A named unique index (createTable ignores a named `unique` on a column).
  await queryInterface.addIndex('invitations', ['token_hash'], { unique: true, name: 'invitations_token_hash_unique' });
  await queryInterface.addIndex('invitations', ['workspace_id'], { name: 'invitations_workspace_id' });
};

export const down: Migration = async ({ context: queryInterface }) => {
  await queryInterface.dropTable('invitations');
};
