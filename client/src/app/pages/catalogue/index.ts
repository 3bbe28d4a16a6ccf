export { Catalogue as default } from './catalogue';
