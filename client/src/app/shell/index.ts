export { Shell as default } from './shell';
