import { DataTypes, Sequelize } from 'sequelize';
import type { Migration } from '../umzug';
import { tableOptions } from './tableOptions';

/**
 * Saved runs. The run file and the result are stored whole as JSON text; the columns beside
 * them repeat the few facts the workspace table sorts, filters and searches on. The whole CI
 * vectors are a deflate-compressed blob of little-endian float64 values (root after root).
 */
export const up: Migration = async ({ context: queryInterface }) => {
  await queryInterface.createTable(
    'runs',
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
      method_label: { type: DataTypes.STRING(80), allowNull: false },
      electrons: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      determinant_count: { type: DataTypes.BIGINT.UNSIGNED, allowNull: false },
      energy_unit: { type: DataTypes.STRING(8), allowNull: false },
      reference_energy: { type: DataTypes.DOUBLE, allowNull: true },
      lowest_energy: { type: DataTypes.DOUBLE, allowNull: true },
      run_file_hash: { type: DataTypes.CHAR(64), allowNull: false },
      solver_version: { type: DataTypes.STRING(40), allowNull: false },
      run_file: { type: DataTypes.TEXT('long'), allowNull: false },
      result: { type: DataTypes.TEXT('long'), allowNull: false },
      ci_vector: { type: DataTypes.BLOB('long'), allowNull: true },
      ci_vector_roots: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      ci_vector_length: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      ci_vector_bytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      created_at: { type: DataTypes.DATE(3), allowNull: false, defaultValue: Sequelize.literal('CURRENT_TIMESTAMP(3)') },
      updated_at: { type: DataTypes.DATE(3), allowNull: false, defaultValue: Sequelize.literal('CURRENT_TIMESTAMP(3)') },
    },
    tableOptions,
  );
  await queryInterface.addIndex('runs', ['public_id'], { unique: true, name: 'runs_public_id_unique' });
  await queryInterface.addIndex('runs', ['workspace_id', 'created_at'], { name: 'runs_workspace_created' });
  await queryInterface.addIndex('runs', ['workspace_id', 'run_file_hash'], { name: 'runs_workspace_hash' });

  await queryInterface.createTable(
    'run_tags',
    {
      run_id: {
        type: DataTypes.INTEGER.UNSIGNED,
        allowNull: false,
        primaryKey: true,
        references: { model: 'runs', key: 'id' },
        onDelete: 'CASCADE',
        onUpdate: 'CASCADE',
      },
      tag: { type: DataTypes.STRING(40), allowNull: false, primaryKey: true },
    },
    tableOptions,
  );
  await queryInterface.addIndex('run_tags', ['tag'], { name: 'run_tags_tag' });
};

export const down: Migration = async ({ context: queryInterface }) => {
  await queryInterface.dropTable('run_tags');
  await queryInterface.dropTable('runs');
};
