import { DataTypes, Sequelize } from 'sequelize';
import type { Migration } from '../umzug';
import { tableOptions } from './tableOptions';

/**
 * Saved scans: the scan's run file, and one row per finished point so a scan computed in the
 * browser survives a reload and resumes where it stopped. `summary` holds the assembled curves
 * and constants once the scan is complete, so it re-plots without recomputation.
 */
export const up: Migration = async ({ context: queryInterface }) => {
  await queryInterface.createTable(
    'scans',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      public_id: { type: DataTypes.CHAR(16), allowNull: false },
      workspace_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        references: { model: 'workspaces', key: 'id' },
        onDelete: 'CASCADE',
        onUpdate: 'CASCADE',
      },
      project_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: true,
        references: { model: 'projects', key: 'id' },
        onDelete: 'SET NULL',
        onUpdate: 'CASCADE',
      },
      created_by: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: true,
        references: { model: 'users', key: 'id' },
        onDelete: 'SET NULL',
        onUpdate: 'CASCADE',
      },
      title: { type: DataTypes.STRING(200), allowNull: false },
      system_label: { type: DataTypes.STRING(120), allowNull: false },
      basis_label: { type: DataTypes.STRING(80), allowNull: false },
      methods_label: { type: DataTypes.STRING(200), allowNull: false },
      point_count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      status: { type: DataTypes.ENUM('running', 'done', 'cancelled'), allowNull: false, defaultValue: 'running' },
      scan_file_hash: { type: DataTypes.CHAR(64), allowNull: false },
      scan_file: { type: DataTypes.TEXT('long'), allowNull: false },
      summary: { type: DataTypes.TEXT('long'), allowNull: true },
      created_at: { type: DataTypes.DATE(3), allowNull: false, defaultValue: Sequelize.literal('CURRENT_TIMESTAMP(3)') },
      updated_at: { type: DataTypes.DATE(3), allowNull: false, defaultValue: Sequelize.literal('CURRENT_TIMESTAMP(3)') },
    },
    tableOptions,
  );
  await queryInterface.addIndex('scans', ['public_id'], { unique: true, name: 'scans_public_id_unique' });
  await queryInterface.addIndex('scans', ['workspace_id', 'created_at'], { name: 'scans_workspace_created' });

  await queryInterface.createTable(
    'scan_points',
    {
      scan_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        primaryKey: true,
        references: { model: 'scans', key: 'id' },
        onDelete: 'CASCADE',
        onUpdate: 'CASCADE',
      },
      point_index: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, primaryKey: true },
      result: { type: DataTypes.TEXT('long'), allowNull: false },
      created_at: { type: DataTypes.DATE(3), allowNull: false, defaultValue: Sequelize.literal('CURRENT_TIMESTAMP(3)') },
    },
    tableOptions,
  );
};

export const down: Migration = async ({ context: queryInterface }) => {
  await queryInterface.dropTable('scan_points');
  await queryInterface.dropTable('scans');
};
