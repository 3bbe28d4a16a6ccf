export { LotDetail as default } from './lot';
