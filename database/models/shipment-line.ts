// One lot's row in a shipment: what was expected and found, whether it was accepted, and where it went.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { Fridge } from './fridge.js';
import type { Presentation } from './presentation.js';

export class ShipmentLine extends Model<InferAttributes<ShipmentLine>, InferCreationAttributes<ShipmentLine>> {
  declare id: CreationOptional<number>;
  declare shipmentId: number;
  declare lineNo: number;
  declare presentationId: number;
  /** Set exactly when the line's intact vials went into stock. */
  declare lotId: number | null;
  declare scan: CreationOptional<string>;
  declare lotNumber: string;
  declare expiry: string;
  declare expiryDayGiven: CreationOptional<boolean>;
  declare vialsExpected: number;
  declare vialsIntact: number;
  declare vialsBroken: number;
  declare vialsMissing: number;
  declare accepted: boolean;
  declare fridgeId: number | null;
  declare storedAt: Date | null;
  declare notes: CreationOptional<string>;
  declare presentation?: NonAttribute<Presentation>;
  declare fridge?: NonAttribute<Fridge | null>;

  static initModel(sequelize: Sequelize): void {
    ShipmentLine.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        shipmentId: { type: DataTypes.INTEGER, allowNull: false },
        lineNo: { type: DataTypes.INTEGER, allowNull: false },
        presentationId: { type: DataTypes.INTEGER, allowNull: false },
        lotId: { type: DataTypes.INTEGER, allowNull: true },
        scan: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        lotNumber: { type: DataTypes.TEXT, allowNull: false },
        expiry: { type: DataTypes.DATEONLY, allowNull: false },
        expiryDayGiven: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        vialsExpected: { type: DataTypes.INTEGER, allowNull: false },
        vialsIntact: { type: DataTypes.INTEGER, allowNull: false },
        vialsBroken: { type: DataTypes.INTEGER, allowNull: false },
        vialsMissing: { type: DataTypes.INTEGER, allowNull: false },
        accepted: { type: DataTypes.BOOLEAN, allowNull: false },
        fridgeId: { type: DataTypes.INTEGER, allowNull: true },
        storedAt: { type: DataTypes.DATE, allowNull: true },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      },
      { sequelize, tableName: 'shipment_lines', underscored: true, timestamps: false },
    );
  }
}
