export { Fridge as default } from './fridge';
