export { Sites as default } from './sites';
