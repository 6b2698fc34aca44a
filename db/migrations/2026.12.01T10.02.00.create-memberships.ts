import { DataTypes, Sequelize } from 'sequelize';
import type { Migration } from '../umzug';
import { tableOptions } from './tableOptions';

export const up: Migration = async ({ context: queryInterface }) => {
  await queryInterface.createTable(
    'memberships',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      workspace_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'workspaces', key: 'id' },
        onDelete: 'CASCADE',
        onUpdate: 'CASCADE',
      },
      user_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'users', key: 'id' },
        onDelete: 'CASCADE',
        onUpdate: 'CASCADE',
      },
      role: { type: DataTypes.ENUM('owner', 'editor', 'viewer'), allowNull: false },
      created_at: { type: DataTypes.DATE(3), allowNull: false, defaultValue: Sequelize.literal('CURRENT_TIMESTAMP(3)') },
      updated_at: { type: DataTypes.DATE(3), allowNull: false, defaultValue: Sequelize.literal('CURRENT_TIMESTAMP(3)') },
    },
    tableOptions,
  );
  // One membership per person and workspace; the index also serves "members of a workspace".
  await queryInterface.addIndex('memberships', ['workspace_id', 'user_id'], {
    unique: true,
    name: 'memberships_workspace_user_unique',
  });
  await queryInterface.addIndex('memberships', ['user_id'], { name: 'memberships_user_id' });
};

export const down: Migration = async ({ context: queryInterface }) => {
  await queryInterface.dropTable('memberships');
};
