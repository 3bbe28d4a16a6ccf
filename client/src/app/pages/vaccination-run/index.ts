export { VaccinationRun as default } from './vaccination-run';
