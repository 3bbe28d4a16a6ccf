export { LogImport as default } from './log-import';
