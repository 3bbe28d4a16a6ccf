// The range used when none is configured: 35–45 °F, the common practice for refrigerated vaccines.
import type { TemperatureRange } from './temperature-range.js';

export const DEFAULT_STORAGE_RANGE: TemperatureRange = Object.freeze({ low: 35, high: 45, unit: 'F' });
