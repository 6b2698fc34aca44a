import { DataTypes, Sequelize } from 'sequelize';
import type { Migration } from '../umzug';
import { tableOptions } from './tableOptions';

export const up: Migration = async ({ context: queryInterface }) => {
  await queryInterface.createTable(
    'sign_in_attempts',
    {
      id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
      email: { type: DataTypes.STRING(254), allowNull: false },
      client_address: { type: DataTypes.STRING(64), allowNull: false },
      succeeded: { type: DataTypes.BOOLEAN, allowNull: false },
      created_at: { type: DataTypes.DATE(3), allowNull: false, defaultValue: Sequelize.literal('CURRENT_TIMESTAMP(3)') },
    },
    tableOptions,
  );
  // The rate limit counts recent attempts per e-mail and per client address.
  await queryInterface.addIndex('sign_in_attempts', ['email', 'created_at'], { name: 'sign_in_attempts_email_created' });
  await queryInterface.addIndex('sign_in_attempts', ['client_address', 'created_at'], {
    name: 'sign_in_attempts_address_created',
  });
};

export const down: Migration = async ({ context: queryInterface }) => {
  await queryInterface.dropTable('sign_in_attempts');
};
