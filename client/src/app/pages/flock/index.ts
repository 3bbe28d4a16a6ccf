export { Flock as default } from './flock';
