export { Programmes as default } from './programmes';
