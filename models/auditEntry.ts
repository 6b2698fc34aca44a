import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** One line of the audit log: who did what, where, from which address. Written once, never updated. */
export class AuditEntry extends Model<InferAttributes<AuditEntry>, InferCreationAttributes<AuditEntry>> {
  declare id: CreationOptional<number>;
  declare actorId: number | null;
  declare action: string;
  declare workspaceId: CreationOptional<number | null>;
  declare targetType: CreationOptional<string | null>;
  declare targetId: CreationOptional<string | null>;
  declare clientAddress: CreationOptional<string | null>;
  declare detail: CreationOptional<Record<string, unknown> | null>;
  declare createdAt: CreationOptional<Date>;
}

export function initAuditEntry(sequelize: Sequelize): void {
  AuditEntry.init(
    {
      id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
      actorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      action: { type: DataTypes.STRING(64), allowNull: false },
      workspaceId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      targetType: { type: DataTypes.STRING(40), allowNull: true },
      targetId: { type: DataTypes.STRING(64), allowNull: true },
      clientAddress: { type: DataTypes.STRING(64), allowNull: true },
      detail: { type: DataTypes.JSON, allowNull: true },
      createdAt: DataTypes.DATE(3),
    },
    { sequelize, modelName: 'AuditEntry', tableName: 'audit_log', updatedAt: false },
  );
}
