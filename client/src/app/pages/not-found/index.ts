export { NotFound as default } from './not-found';
