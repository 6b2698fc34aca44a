import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export type SiteRole = 'admin' | 'member';

/** A person with an account. `email` is kept lower-case so look-ups need no case folding. */
export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  declare email: string;
  declare displayName: string;
  declare passwordHash: string;
  declare siteRole: CreationOptional<SiteRole>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initUser(sequelize: Sequelize): void {
  User.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      email: {
        type: DataTypes.STRING(254),
        allowNull: false,
        unique: true,
        // Whoever writes, the row holds the lower-case form.
        set(value: string) {
          this.setDataValue('email', String(value).trim().toLowerCase());
        },
      },
      displayName: { type: DataTypes.STRING(100), allowNull: false },
      passwordHash: { type: DataTypes.STRING(100), allowNull: false },
      siteRole: { type: DataTypes.ENUM('admin', 'member'), allowNull: false, defaultValue: 'member' },
      createdAt: DataTypes.DATE(3),
      updatedAt: DataTypes.DATE(3),
    },
    { sequelize, modelName: 'User', tableName: 'users' },
  );
}
