// The flocks and demand features' models (programmes, flocks, bird counts, vaccinations, overrides, stock settings, transfers, sendings) and their associations.
import type { Sequelize } from 'sequelize';
import { BirdCount } from './bird-count.js';
import { Flock } from './flock.js';
import { House } from './house.js';
import { PlannedTransfer } from './planned-transfer.js';
import { Product } from './product.js';
import { ProductStockSetting } from './product-stock-setting.js';
import { Programme } from './programme.js';
import { ProgrammeStep } from './programme-step.js';
import { PurchaseOrderSending } from './purchase-order-sending.js';
import { User } from './user.js';
import { Vaccination } from './vaccination.js';
import { WithdrawalOverride } from './withdrawal-override.js';

export { BirdCount, Flock, PlannedTransfer, ProductStockSetting, Programme, ProgrammeStep, PurchaseOrderSending, Vaccination, WithdrawalOverride };

/** Call after the foundation's and receiving's models are initialised (it associates with House, Product and User). */
export function initFlockModels(sequelize: Sequelize): void {
  const models = [Programme, ProgrammeStep, Flock, BirdCount, Vaccination, WithdrawalOverride, ProductStockSetting, PlannedTransfer, PurchaseOrderSending];
  for (const model of models) model.initModel(sequelize);
  Programme.hasMany(ProgrammeStep, { as: 'steps', foreignKey: 'programmeId' });
  ProgrammeStep.belongsTo(Product, { as: 'product', foreignKey: 'productId' });
  Flock.belongsTo(House, { as: 'house', foreignKey: 'houseId' });
  Flock.belongsTo(Programme, { as: 'programme', foreignKey: 'programmeId' });
  Flock.hasMany(BirdCount, { as: 'birdCounts', foreignKey: 'flockId' });
  Vaccination.belongsTo(Flock, { as: 'flock', foreignKey: 'flockId' });
  Vaccination.belongsTo(Product, { as: 'product', foreignKey: 'productId' });
  Vaccination.hasMany(WithdrawalOverride, { as: 'overrides', foreignKey: 'vaccinationId' });
  WithdrawalOverride.belongsTo(User, { as: 'decider', foreignKey: 'decidedBy' });
}
