import { DataTypes, Sequelize } from 'sequelize';
import type { Migration } from '../umzug';
import { tableOptions } from './tableOptions';

export const up: Migration = async ({ context: queryInterface }) => {
  await queryInterface.createTable(
    'workspaces',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      name: { type: DataTypes.STRING(120), allowNull: false },
      slug: { type: DataTypes.STRING(80), allowNull: false },
      description: { type: DataTypes.STRING(2000), allowNull: false, defaultValue: '' },
      // A workspace outlives the account that made it.
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
  // A named unique index (createTable ignores a named `unique` on a column).
  await queryInterface.addIndex('workspaces', ['slug'], { unique: true, name: 'workspaces_slug_unique' });
};

export const down: Migration = async ({ context: queryInterface }) => {
  await queryInterface.dropTable('workspaces');
};
