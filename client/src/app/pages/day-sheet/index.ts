export { DaySheetPage as default } from './day-sheet';
