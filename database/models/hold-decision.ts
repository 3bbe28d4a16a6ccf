// One signed decision of a veterinarian on a hold (never changed; a correction supersedes it).
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { HoldDecisionKind } from '../../shared/lots/lot-status.js';

export class HoldDecision extends Model<InferAttributes<HoldDecision>, InferCreationAttributes<HoldDecision>> {
  declare id: CreationOptional<number>;
  declare holdId: number;
  declare decision: HoldDecisionKind;
  declare condition: CreationOptional<string>;
  declare notes: CreationOptional<string>;
  declare signedBy: number;
  declare signerName: string;
  declare signedAt: CreationOptional<Date>;
  declare signatureMeaning: string;
  declare supersedesId: number | null;

  static initModel(sequelize: Sequelize): void {
    HoldDecision.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        holdId: { type: DataTypes.INTEGER, allowNull: false },
        decision: { type: DataTypes.TEXT, allowNull: false },
        condition: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        signedBy: { type: DataTypes.INTEGER, allowNull: false },
        signerName: { type: DataTypes.TEXT, allowNull: false },
        signedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
        signatureMeaning: { type: DataTypes.TEXT, allowNull: false },
        supersedesId: { type: DataTypes.INTEGER, allowNull: true },
      },
      { sequelize, tableName: 'hold_decisions', underscored: true, timestamps: false },
    );
  }
}
