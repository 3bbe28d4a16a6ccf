export { Receiving as default } from './receiving';
