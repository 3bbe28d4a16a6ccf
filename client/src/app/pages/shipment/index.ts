export { ShipmentPage as default } from './shipment-page';
