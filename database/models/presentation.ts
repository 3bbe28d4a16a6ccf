// A product's pack: doses per vial, vials per pack, the pack's and single vial's GTINs (14 digits), the price.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { Product } from './product.js';

export class Presentation extends Model<InferAttributes<Presentation>, InferCreationAttributes<Presentation>> {
  declare id: CreationOptional<number>;
  declare productId: number;
  declare dosesPerVial: number;
  declare vialsPerPack: CreationOptional<number>;
  declare packGtin: string | null;
  declare vialGtin: string | null;
  declare unitPrice: number | null;
  declare status: CreationOptional<'confirmed' | 'proposed'>;
  declare proposedBy: number | null;
  declare proposedAt: Date | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare product?: NonAttribute<Product>;

  static initModel(sequelize: Sequelize): void {
    Presentation.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        productId: { type: DataTypes.INTEGER, allowNull: false },
        dosesPerVial: { type: DataTypes.INTEGER, allowNull: false },
        vialsPerPack: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 10 },
        packGtin: { type: DataTypes.CHAR(14), allowNull: true },
        vialGtin: { type: DataTypes.CHAR(14), allowNull: true },
        unitPrice: {
          type: DataTypes.DECIMAL(12, 2),
          allowNull: true,
          get(this: Presentation) {
            const value = this.getDataValue('unitPrice');
            return value == null ? null : Number(value);
          },
        },
        status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'confirmed' },
        proposedBy: { type: DataTypes.INTEGER, allowNull: true },
        proposedAt: { type: DataTypes.DATE, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'presentations', underscored: true },
    );
  }
}
