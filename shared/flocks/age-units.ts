// A programme step's age is given in days or weeks (no zod here: the client imports it).
export const ageUnits = ['days', 'weeks'] as const;
export type AgeUnit = (typeof ageUnits)[number];
