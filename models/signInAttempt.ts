import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/** One sign-in try, kept for the rate limit (per e-mail and per client address). */
export class SignInAttempt extends Model<InferAttributes<SignInAttempt>, InferCreationAttributes<SignInAttempt>> {
  declare id: CreationOptional<number>;
  declare email: string;
  declare clientAddress: string;
  declare succeeded: boolean;
  declare createdAt: CreationOptional<Date>;
}

export function initSignInAttempt(sequelize: Sequelize): void {
  SignInAttempt.init(
    {
      id: { type: DataTypes.BIGINT.UNSIGNED, autoIncrement: true, primaryKey: true },
      email: {
        type: DataTypes.STRING(254),
        allowNull: false,
        set(value: string) {
          this.setDataValue('email', String(value).trim().toLowerCase());
        },
      },
      clientAddress: { type: DataTypes.STRING(64), allowNull: false },
      succeeded: { type: DataTypes.BOOLEAN, allowNull: false },
      createdAt: DataTypes.DATE(3),
    },
    { sequelize, modelName: 'SignInAttempt', tableName: 'sign_in_attempts', updatedAt: false },
  );
}
