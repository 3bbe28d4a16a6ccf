// A veterinarian's override of the withdrawal flag on one vaccination: the facts it ruled on, the reason, who and when.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { User } from './user.js';

export class WithdrawalOverride extends Model<InferAttributes<WithdrawalOverride>, InferCreationAttributes<WithdrawalOverride>> {
  declare id: CreationOptional<number>;
  declare vaccinationId: number;
  declare vaccinationDate: string;
  declare depletionDate: string;
  declare withdrawalDays: number;
  declare reason: string;
  declare decidedBy: number;
  declare decidedAt: CreationOptional<Date>;
  declare decider?: NonAttribute<User>;

  static initModel(sequelize: Sequelize): void {
    WithdrawalOverride.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        vaccinationId: { type: DataTypes.INTEGER, allowNull: false },
        vaccinationDate: { type: DataTypes.DATEONLY, allowNull: false },
        depletionDate: { type: DataTypes.DATEONLY, allowNull: false },
        withdrawalDays: { type: DataTypes.INTEGER, allowNull: false },
        reason: { type: DataTypes.TEXT, allowNull: false },
        decidedBy: { type: DataTypes.INTEGER, allowNull: false },
        decidedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { sequelize, tableName: 'withdrawal_overrides', underscored: true, timestamps: false },
    );
  }
}
