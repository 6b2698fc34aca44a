import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

/**
 * A saved run: its run file and result as JSON text, the whole CI vectors as a compressed
 * blob (when they fit the limit), and the summary columns the workspace's run table uses.
 */
export class Run extends Model<InferAttributes<Run>, InferCreationAttributes<Run>> {
  declare id: CreationOptional<number>;
  declare publicId: string;
  declare workspaceId: number;
  declare projectId: number | null;
  declare createdBy: number | null;
  declare title: string;
  declare systemLabel: string;
  declare basisLabel: string;
  declare methodLabel: string;
  declare electrons: number;
  declare determinantCount: number;
  declare energyUnit: string;
  declare referenceEnergy: number | null;
  declare lowestEnergy: number | null;
  declare runFileHash: string;
  declare solverVersion: string;
  declare runFile: string;
  declare result: string;
  declare ciVector: Buffer | null;
  declare ciVectorRoots: number | null;
  declare ciVectorLength: number | null;
  declare ciVectorBytes: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initRun(sequelize: Sequelize): void {
  Run.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      publicId: { type: DataTypes.CHAR(16), allowNull: false },
      workspaceId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      projectId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      createdBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      title: { type: DataTypes.STRING(200), allowNull: false },
      systemLabel: { type: DataTypes.STRING(120), allowNull: false },
      basisLabel: { type: DataTypes.STRING(80), allowNull: false },
      methodLabel: { type: DataTypes.STRING(80), allowNull: false },
      electrons: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      // BIGINT comes back from the driver as a string unless converted.
      determinantCount: {
        type: DataTypes.BIGINT.UNSIGNED,
        allowNull: false,
        get() {
          return Number(this.getDataValue('determinantCount'));
        },
      },
      energyUnit: { type: DataTypes.STRING(8), allowNull: false },
      referenceEnergy: { type: DataTypes.DOUBLE, allowNull: true },
      lowestEnergy: { type: DataTypes.DOUBLE, allowNull: true },
      runFileHash: { type: DataTypes.CHAR(64), allowNull: false },
      solverVersion: { type: DataTypes.STRING(40), allowNull: false },
      runFile: { type: DataTypes.TEXT('long'), allowNull: false },
      result: { type: DataTypes.TEXT('long'), allowNull: false },
      ciVector: { type: DataTypes.BLOB('long'), allowNull: true },
      ciVectorRoots: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      ciVectorLength: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      ciVectorBytes: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      createdAt: DataTypes.DATE(3),
      updatedAt: DataTypes.DATE(3),
    },
    { sequelize, modelName: 'Run', tableName: 'runs' },
  );
}

/** One tag on one run; (run, tag) is the key. */
export class RunTag extends Model<InferAttributes<RunTag>, InferCreationAttributes<RunTag>> {
  declare runId: number;
  declare tag: string;
}

export function initRunTag(sequelize: Sequelize): void {
  RunTag.init(
    {
      runId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, primaryKey: true },
      tag: { type: DataTypes.STRING(40), allowNull: false, primaryKey: true },
    },
    { sequelize, modelName: 'RunTag', tableName: 'run_tags', timestamps: false },
  );
}
