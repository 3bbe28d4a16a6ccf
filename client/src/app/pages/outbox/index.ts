export { Outbox as default } from './outbox';
