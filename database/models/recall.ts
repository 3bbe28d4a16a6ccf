// A recall placed by a veterinarian: a lot number (any letter case), optionally one product, and why.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class Recall extends Model<InferAttributes<Recall>, InferCreationAttributes<Recall>> {
  declare id: CreationOptional<number>;
  declare lotNumber: string;
  declare productId: number | null;
  declare reason: string;
  declare placedBy: number;
  declare placedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize): void {
    Recall.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        lotNumber: { type: DataTypes.TEXT, allowNull: false },
        productId: { type: DataTypes.INTEGER, allowNull: true },
        reason: { type: DataTypes.TEXT, allowNull: false },
        placedBy: { type: DataTypes.INTEGER, allowNull: false },
        placedAt: { type: DataTypes.DATE, allowNull: false, defaultValue: DataTypes.NOW },
      },
      { sequelize, tableName: 'recalls', underscored: true, timestamps: false },
    );
  }
}
