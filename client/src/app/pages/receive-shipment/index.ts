export { ReceiveShipment as default } from './receive-shipment';
