// One step of a programme: which product, at what age (days or weeks), by which route.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { ProductRoute } from '../../shared/catalogue/product-kinds.js';
import type { AgeUnit } from '../../shared/flocks/age-units.js';
import type { Product } from './product.js';

export class ProgrammeStep extends Model<InferAttributes<ProgrammeStep>, InferCreationAttributes<ProgrammeStep>> {
  declare id: CreationOptional<number>;
  declare programmeId: number;
  declare position: number;
  declare productId: number;
  declare ageValue: number;
  declare ageUnit: AgeUnit;
  declare route: ProductRoute;
  declare notes: CreationOptional<string>;
  declare product?: NonAttribute<Product>;

  static initModel(sequelize: Sequelize): void {
    ProgrammeStep.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        programmeId: { type: DataTypes.INTEGER, allowNull: false },
        position: { type: DataTypes.INTEGER, allowNull: false },
        productId: { type: DataTypes.INTEGER, allowNull: false },
        ageValue: { type: DataTypes.INTEGER, allowNull: false },
        ageUnit: { type: DataTypes.TEXT, allowNull: false },
        route: { type: DataTypes.TEXT, allowNull: false },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
      },
      { sequelize, tableName: 'programme_steps', underscored: true, timestamps: false },
    );
  }
}
