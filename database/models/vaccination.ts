// A vaccination of a flock: product, route and planned date (from a programme step or by hand), and its status.
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type NonAttribute, type Sequelize } from 'sequelize';
import type { ProductRoute } from '../../shared/catalogue/product-kinds.js';
import type { VaccinationStatus } from '../../shared/flocks/vaccination-statuses.js';
import type { Flock } from './flock.js';
import type { Product } from './product.js';
import type { WithdrawalOverride } from './withdrawal-override.js';

export class Vaccination extends Model<InferAttributes<Vaccination>, InferCreationAttributes<Vaccination>> {
  declare id: CreationOptional<number>;
  declare flockId: number;
  declare programmeStepId: number | null;
  declare productId: number;
  declare route: ProductRoute;
  declare plannedDate: string;
  declare movedByHand: CreationOptional<boolean>;
  declare status: CreationOptional<VaccinationStatus>;
  declare notes: CreationOptional<string>;
  declare confirmedBy: CreationOptional<number | null>;
  declare confirmedAt: CreationOptional<Date | null>;
  declare cancelledBy: CreationOptional<number | null>;
  declare cancelledAt: CreationOptional<Date | null>;
  declare cancelReason: CreationOptional<string | null>;
  declare createdBy: number | null;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare flock?: NonAttribute<Flock>;
  declare product?: NonAttribute<Product>;
  declare overrides?: NonAttribute<WithdrawalOverride[]>;

  static initModel(sequelize: Sequelize): void {
    Vaccination.init(
      {
        id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
        flockId: { type: DataTypes.INTEGER, allowNull: false },
        programmeStepId: { type: DataTypes.INTEGER, allowNull: true },
        productId: { type: DataTypes.INTEGER, allowNull: false },
        route: { type: DataTypes.TEXT, allowNull: false },
        plannedDate: { type: DataTypes.DATEONLY, allowNull: false },
        movedByHand: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        status: { type: DataTypes.TEXT, allowNull: false, defaultValue: 'planned' },
        notes: { type: DataTypes.TEXT, allowNull: false, defaultValue: '' },
        confirmedBy: { type: DataTypes.INTEGER, allowNull: true },
        confirmedAt: { type: DataTypes.DATE, allowNull: true },
        cancelledBy: { type: DataTypes.INTEGER, allowNull: true },
        cancelledAt: { type: DataTypes.DATE, allowNull: true },
        cancelReason: { type: DataTypes.TEXT, allowNull: true },
        createdBy: { type: DataTypes.INTEGER, allowNull: true },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'vaccinations', underscored: true },
    );
  }
}
