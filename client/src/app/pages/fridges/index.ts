export { Fridges as default } from './fridges';
