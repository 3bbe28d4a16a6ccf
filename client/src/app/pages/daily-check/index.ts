export { DailyCheck as default } from './daily-check';
