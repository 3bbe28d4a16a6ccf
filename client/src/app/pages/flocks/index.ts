export { Flocks as default } from './flocks';
