// The two kinds of bird-number update, with the words the screens show (no zod here: the client imports it).
export const birdCountKinds = ['mortality', 'count'] as const;
export type BirdCountKind = (typeof birdCountKinds)[number];

export const birdCountKindLabels: Record<BirdCountKind, string> = { mortality: 'Mortality', count: 'Headcount' };
