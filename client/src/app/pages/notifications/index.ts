export { Notifications as default } from './notifications';
