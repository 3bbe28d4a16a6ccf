export { PurchaseOrders as default } from './purchase-orders';
