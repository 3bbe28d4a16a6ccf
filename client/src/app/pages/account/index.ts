export { Account as default } from './account';
