export { Users as default } from './users';
