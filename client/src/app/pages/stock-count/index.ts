export { StockCountSheet as default } from './stock-count';
