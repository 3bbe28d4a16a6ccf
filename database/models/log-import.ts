// One uploaded logger file: who brought it, what it held, and what was stored from it.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { ReadingConflict } from '../../shared/fridges/log-import-view.js';
import type { LogLayout } from '../../shared/logs/log-layout.js';
import type { LogWarning } from '../../shared/logs/log-warning.js';

export class LogImport extends Model<InferAttributes<LogImport>, InferCreationAttributes<LogImport>> {
  declare id: CreationOptional<number>;
  declare loggerId: number;
  declare fileName: string;
  declare sha256: string;
  declare sizeBytes: number;
  declare storedName: string;
  declare source: 'upload' | 'cli';
  declare importedBy: number | null;
  declare importedAt: CreationOptional<Date>;
  declare rowsRead: number;
  declare readingsStored: number;
  declare duplicates: number;
  declare conflicts: number;
  declare skipped: number;
  declare firstAt: Date;
  declare lastAt: Date;
  declare layout: LogLayout;
  declare warningCount: number;
  declare warnings: LogWarning[];
  declare conflictSamples: ReadingConflict[];

  static initModel(sequelize: Sequelize): void {
    LogImport.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        loggerId: { type: DataTypes.INTEGER, allowNull: false },
        fileName: { type: DataTypes.TEXT, allowNull: false },
        sha256: { type: DataTypes.CHAR(64), allowNull: false },
        // BIGINT arrives from pg as a string; files are at most 50 MB, well inside a number.
        sizeBytes: { type: DataTypes.BIGINT, allowNull: false, get() { return Number(this.getDataValue('sizeBytes')); } },
        storedName: { type: DataTypes.TEXT, allowNull: false },
        source: { type: DataTypes.TEXT, allowNull: false },
        importedBy: { type: DataTypes.INTEGER, allowNull: true },
        importedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
        rowsRead: { type: DataTypes.INTEGER, allowNull: false },
        readingsStored: { type: DataTypes.INTEGER, allowNull: false },
        duplicates: { type: DataTypes.INTEGER, allowNull: false },
        conflicts: { type: DataTypes.INTEGER, allowNull: false },
        skipped: { type: DataTypes.INTEGER, allowNull: false },
        firstAt: { type: DataTypes.DATE, allowNull: false },
        lastAt: { type: DataTypes.DATE, allowNull: false },
        layout: { type: DataTypes.JSONB, allowNull: false },
        warningCount: { type: DataTypes.INTEGER, allowNull: false },
        warnings: { type: DataTypes.JSONB, allowNull: false },
        conflictSamples: { type: DataTypes.JSONB, allowNull: false },
      },
      { sequelize, tableName: 'log_imports', underscored: true, timestamps: false },
    );
  }
}
