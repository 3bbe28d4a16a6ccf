// A temperature logger in a fridge: primary or backup, in service from one date to another, with its remembered mapping.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { LoggerRole } from '../../shared/fridges/logger-schemas.js';
import type { StoredLogMapping } from '../../shared/fridges/log-mapping-schema.js';
import type { LoggerCertificate } from './logger-certificate.js';

export class Logger extends Model<InferAttributes<Logger>, InferCreationAttributes<Logger>> {
  declare id: CreationOptional<number>;
  declare fridgeId: number;
  declare serial: string;
  declare model: CreationOptional<string>;
  declare role: LoggerRole;
  declare installedOn: CreationOptional<string>;
  declare removedOn: CreationOptional<string | null>;
  declare mapping: CreationOptional<StoredLogMapping>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare certificates?: NonAttribute<LoggerCertificate[]>;

  static initModel(sequelize: Sequelize): void {
    Logger.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        fridgeId: { type: DataTypes.INTEGER, allowNull: false },
        serial: { type: DataTypes.TEXT, allowNull: false },
        model: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        role: { type: DataTypes.TEXT, allowNull: false },
        installedOn: { type: DataTypes.DATEONLY, allowNull: false, defaultValue: DataTypes.NOW },
        removedOn: { type: DataTypes.DATEONLY, allowNull: true },
        mapping: { type: DataTypes.JSONB, allowNull: false, defaultValue: {} },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'loggers', underscored: true },
    );
  }
}
