// Vials of a lot purchasing plans to move from one site to another before a shortfall there.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class PlannedTransfer extends Model<InferAttributes<PlannedTransfer>, InferCreationAttributes<PlannedTransfer>> {
  declare id: CreationOptional<number>;
  declare lotId: number;
  declare fromSiteId: number;
  declare toSiteId: number;
  declare vials: number;
  declare plannedOn: string;
  declare status: CreationOptional<'planned' | 'done' | 'cancelled'>;
  declare notes: CreationOptional<string>;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    PlannedTransfer.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        lotId: { type: DataTypes.INTEGER, allowNull: false },
        fromSiteId: { type: DataTypes.INTEGER, allowNull: false },
        toSiteId: { type: DataTypes.INTEGER, allowNull: false },
        vials: { type: DataTypes.INTEGER, allowNull: false },
        plannedOn: { type: DataTypes.DATEONLY, allowNull: false },
        status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'planned' },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        createdBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'planned_transfers', underscored: true },
    );
  }
}
