// How birds are kept in a house, with the words the screens show (no zod here: the client imports it).
export const housings = ['cage', 'aviary', 'floor'] as const;
export type Housing = (typeof housings)[number];

export const housingLabels: Record<Housing, string> = { cage: 'Cage', aviary: 'Aviary', floor: 'Floor' };
