// The receiving feature's models (catalogue, orders, shipments, lots, ledger, holds) and their associations.
import type { Sequelize } from 'sequelize';
import { Fridge } from './fridge.js';
import { Hold } from './hold.js';
import { Lot } from './lot.js';
import { Presentation } from './presentation.js';
import { Product } from './product.js';
import { PurchaseOrder } from './purchase-order.js';
import { PurchaseOrderLine } from './purchase-order-line.js';
import { Shipment } from './shipment.js';
import { ShipmentLine } from './shipment-line.js';
import { ShipmentPhoto } from './shipment-photo.js';
import { Site } from './site.js';
import { StockBalance } from './stock-balance.js';
import { StockMovement } from './stock-movement.js';
import { Supplier } from './supplier.js';
import { User } from './user.js';

export { Hold, Lot, Presentation, Product, PurchaseOrder, PurchaseOrderLine, Shipment, ShipmentLine, ShipmentPhoto, StockBalance, StockMovement, Supplier };

/** Call after the foundation's models are initialised (it associates with Site, User and Fridge). */
export function initReceivingModels(sequelize: Sequelize): void {
  const models = [Supplier, Product, Presentation, PurchaseOrder, PurchaseOrderLine, Lot, Shipment, ShipmentLine, ShipmentPhoto, StockMovement, StockBalance, Hold];
  for (const model of models) model.initModel(sequelize);
  Product.hasMany(Presentation, { as: 'presentations', foreignKey: 'productId' });
  Presentation.belongsTo(Product, { as: 'product', foreignKey: 'productId' });
  PurchaseOrder.hasMany(PurchaseOrderLine, { as: 'lines', foreignKey: 'purchaseOrderId' });
  PurchaseOrder.belongsTo(Supplier, { as: 'supplier', foreignKey: 'supplierId' });
  PurchaseOrder.belongsTo(Site, { as: 'site', foreignKey: 'siteId' });
  PurchaseOrderLine.belongsTo(Presentation, { as: 'presentation', foreignKey: 'presentationId' });
  Lot.belongsTo(Presentation, { as: 'presentation', foreignKey: 'presentationId' });
  Shipment.belongsTo(Site, { as: 'site', foreignKey: 'siteId' });
  Shipment.belongsTo(Supplier, { as: 'supplier', foreignKey: 'supplierId' });
  Shipment.belongsTo(PurchaseOrder, { as: 'purchaseOrder', foreignKey: 'purchaseOrderId' });
  Shipment.belongsTo(User, { as: 'receiver', foreignKey: 'receivedBy' });
  Shipment.hasMany(ShipmentLine, { as: 'lines', foreignKey: 'shipmentId' });
  Shipment.hasMany(ShipmentPhoto, { as: 'photos', foreignKey: 'shipmentId' });
  ShipmentLine.belongsTo(Presentation, { as: 'presentation', foreignKey: 'presentationId' });
  ShipmentLine.belongsTo(Fridge, { as: 'fridge', foreignKey: 'fridgeId' });
}
