export { Purchasing as default } from './purchasing';
