export { WaterVolumesPage as default } from './water-volumes';
