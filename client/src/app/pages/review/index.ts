export { Review as default } from './review';
