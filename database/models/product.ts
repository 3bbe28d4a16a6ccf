// A vaccine as its label describes it; the storage range is kept as entered (value and unit).
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { ProductKind, ProductRoute } from '../../shared/catalogue/product-kinds.js';
import type { Presentation } from './presentation.js';

const decimal = (name: 'storageLow' | 'storageHigh') => ({
  type: DataTypes.DECIMAL(6, 2),
  allowNull: false,
  // DECIMAL arrives from pg as a string; the getter hands out a number.
  get(this: Product) {
    return Number(this.getDataValue(name));
  },
});

export class Product extends Model<InferAttributes<Product>, InferCreationAttributes<Product>> {
  declare id: CreationOptional<number>;
  declare name: string;
  declare maker: CreationOptional<string>;
  declare kind: ProductKind | null;
  declare route: ProductRoute | null;
  declare storageLow: number;
  declare storageHigh: number;
  declare storageUnit: 'F' | 'C';
  declare freezeSensitive: CreationOptional<boolean>;
  declare useWithinMinutes: number | null;
  declare timeOutLimitMinutes: CreationOptional<number | null>;
  declare withdrawalDays: CreationOptional<number>;
  declare notes: CreationOptional<string>;
  declare status: CreationOptional<'confirmed' | 'proposed'>;
  declare proposedBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare presentations?: NonAttribute<Presentation[]>;

  static initModel(sequelize: Sequelize): void {
    Product.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        name: { type: DataTypes.TEXT, allowNull: false },
        maker: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        kind: { type: DataTypes.TEXT, allowNull: true },
        route: { type: DataTypes.TEXT, allowNull: true },
        storageLow: decimal('storageLow'),
        storageHigh: decimal('storageHigh'),
        storageUnit: { type: DataTypes.CHAR(1), allowNull: false },
        freezeSensitive: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: true },
        useWithinMinutes: { type: DataTypes.INTEGER, allowNull: true },
        timeOutLimitMinutes: { type: DataTypes.INTEGER, allowNull: true },
        withdrawalDays: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 21 },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'confirmed' },
        proposedBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'products', underscored: true },
    );
  }
}
