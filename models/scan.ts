import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type Sequelize,
} from 'sequelize';

export type ScanStatus = 'running' | 'done' | 'cancelled';

/** A saved scan: its run file (with `scan` and `methods`), its status and, when complete, the assembled summary. */
export class Scan extends Model<InferAttributes<Scan>, InferCreationAttributes<Scan>> {
  declare id: CreationOptional<number>;
  declare publicId: string;
  declare workspaceId: number;
  declare projectId: number | null;
  declare createdBy: number | null;
  declare title: string;
  declare systemLabel: string;
  declare basisLabel: string;
  declare methodsLabel: string;
  declare pointCount: number;
  declare status: CreationOptional<ScanStatus>;
  declare scanFileHash: string;
  declare scanFile: string;
  declare summary: string | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

export function initScan(sequelize: Sequelize): void {
  Scan.init(
    {
      id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
      publicId: { type: DataTypes.CHAR(16), allowNull: false },
      workspaceId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      projectId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      createdBy: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
      title: { type: DataTypes.STRING(200), allowNull: false },
      systemLabel: { type: DataTypes.STRING(120), allowNull: false },
      basisLabel: { type: DataTypes.STRING(80), allowNull: false },
      methodsLabel: { type: DataTypes.STRING(200), allowNull: false },
      pointCount: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      status: { type: DataTypes.ENUM('running', 'done', 'cancelled'), allowNull: false, defaultValue: 'running' },
      scanFileHash: { type: DataTypes.CHAR(64), allowNull: false },
      scanFile: { type: DataTypes.TEXT('long'), allowNull: false },
      summary: { type: DataTypes.TEXT('long'), allowNull: true },
      createdAt: DataTypes.DATE(3),
      updatedAt: DataTypes.DATE(3),
    },
    { sequelize, modelName: 'Scan', tableName: 'scans' },
  );
}

/** One finished point of a scan; (scan, index) is the key, so saving a point again replaces it. */
export class ScanPoint extends Model<InferAttributes<ScanPoint>, InferCreationAttributes<ScanPoint>> {
  declare scanId: number;
  declare pointIndex: number;
  declare result: string;
  declare createdAt: CreationOptional<Date>;
}

export function initScanPoint(sequelize: Sequelize): void {
  ScanPoint.init(
    {
      scanId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, primaryKey: true },
      pointIndex: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, primaryKey: true },
      result: { type: DataTypes.TEXT('long'), allowNull: false },
      createdAt: DataTypes.DATE(3),
    },
    { sequelize, modelName: 'ScanPoint', tableName: 'scan_points', updatedAt: false },
  );
}
