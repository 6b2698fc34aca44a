import { DataTypes, Sequelize } from 'sequelize';
import type { Migration } from '../umzug';
import { tableOptions } from './tableOptions';

export const up: Migration = async ({ context: queryInterface }) => {
  await queryInterface.createTable(
    'mail_outbox',
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      message_id: { type: DataTypes.STRING(255), allowNull: true },
      envelope_from: { type: DataTypes.STRING(254), allowNull: false, defaultValue: '' },
      // Comma-separated envelope recipients, as the fake SMTP server received them.
      envelope_to: { type: DataTypes.STRING(2000), allowNull: false, defaultValue: '' },
      subject: { type: DataTypes.STRING(255), allowNull: false, defaultValue: '' },
      text_body: { type: DataTypes.TEXT('medium'), allowNull: false },
      html_body: { type: DataTypes.TEXT('medium'), allowNull: true },
      received_at: { type: DataTypes.DATE(3), allowNull: false },
      created_at: { type: DataTypes.DATE(3), allowNull: false, defaultValue: Sequelize.literal('CURRENT_TIMESTAMP(3)') },
      updated_at: { type: DataTypes.DATE(3), allowNull: false, defaultValue: Sequelize.literal('CURRENT_TIMESTAMP(3)') },
    },
    tableOptions,
  );
  await queryInterface.addIndex('mail_outbox', ['received_at'], { name: 'mail_outbox_received_at' });
};

export const down: Migration = async ({ context: queryInterface }) => {
  await queryInterface.dropTable('mail_outbox');
};
