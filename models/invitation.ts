import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';
import type { WorkspaceRole } from './membership';

/** An e-mailed offer to join a workspace; only the SHA-256 of its token is stored. */
export class Invitation extends Model<InferAttributes<Invitation>, InferCreationAttributes<Invitation>> {
  declare id: CreationOptional<number>;
  declare workspaceId: number;
  declare email: string;
  declare role: WorkspaceRole;
  declare tokenHash: string;
  declare invitedBy: number | null;
  declare expiresAt: Date;
  declare acceptedAt: CreationOptional<Date | null>;
  declare acceptedBy: CreationOptional<number | null>;
  declare revokedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initInvitation(sequelize: Sequelize): void {
  Invitation.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      workspaceId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      email: {
        type: DataTypes.STRING(254),
        allowNull: false,
        set(value: string) {
          this.setDataValue('email', String(value).trim().toLowerCase());
        },
      },
      role: { type: DataTypes.ENUM('owner', 'editor', 'viewer'), allowNull: false },
      tokenHash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
      invitedBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      expiresAt: { type: DataTypes.DATE(3), allowNull: false },
      acceptedAt: { type: DataTypes.DATE(3), allowNull: true },
      acceptedBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      revokedAt: { type: DataTypes.DATE(3), allowNull: true },
      createdAt: DataTypes.DATE(3),
      updatedAt: DataTypes.DATE(3),
    },
    { sequelize, modelName: 'Invitation', tableName: 'invitations' },
  );
}
