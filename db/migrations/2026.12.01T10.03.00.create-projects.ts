import { DataTypes, Sequelize } from 'sequelize';
import type { Migration } from '../umzug';
import { tableOptions } from './tableOptions';

export const up: Migration = async ({ context: queryInterface }) => {
  await queryInterface.createTable(
    'projects',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      workspace_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'workspaces', key: 'id' },
        onDelete: 'CASCADE',
        onUpdate: 'CASCADE',
      },
      name: { type: DataTypes.STRING(120), allowNull: false },
      description: { type: DataTypes.STRING(2000), allowNull: false, defaultValue: '' },
      created_by: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: true,
        references: { model: 'users', key: 'id' },
        onDelete: 'SET NULL',
        onUpdate: 'CASCADE',
      },
      created_at: { type: DataTypes.DATE(3), allowNull: false, defaultValue: Sequelize.literal('CURRENT_TIMESTAMP(3)') },
      updated_at: { type: DataTypes.DATE(3), allowNull: false, defaultValue: Sequelize.literal('CURRENT_TIMESTAMP(3)') },
    },
    tableOptions,
  );
  await queryInterface.addIndex('projects', ['workspace_id', 'name'], { unique: true, name: 'projects_workspace_name_unique' });
};

export const down: Migration = async ({ context: queryInterface }) => {
  await queryInterface.dropTable('projects');
};
