export { Lots as default } from './lots';
