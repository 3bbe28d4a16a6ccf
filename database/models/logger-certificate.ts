// A logger's calibration certificate (PDF or image) with its calibration and due dates.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class LoggerCertificate extends Model<InferAttributes<LoggerCertificate>, InferCreationAttributes<LoggerCertificate>> {
  declare id: CreationOptional<number>;
  declare loggerId: number;
  declare calibratedOn: string;
  declare dueOn: string;
  declare fileName: string;
  declare contentType: string;
  declare storedName: string;
  declare sizeBytes: number;
  declare sha256: string;
  declare uploadedBy: number | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    LoggerCertificate.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        loggerId: { type: DataTypes.INTEGER, allowNull: false },
        calibratedOn: { type: DataTypes.DATEONLY, allowNull: false },
        dueOn: { type: DataTypes.DATEONLY, allowNull: false },
        fileName: { type: DataTypes.TEXT, allowNull: false },
        contentType: { type: DataTypes.TEXT, allowNull: false },
        storedName: { type: DataTypes.TEXT, allowNull: false },
        sizeBytes: { type: DataTypes.INTEGER, allowNull: false },
        sha256: { type: DataTypes.CHAR(64), allowNull: false },
        uploadedBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'logger_certificates', underscored: true, updatedAt: false },
    );
  }
}
