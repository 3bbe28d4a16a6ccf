// The readiness checks before a vaccination starts, who they are about, and the words the screens show (no zod: the client imports it).
export const memberCheckKinds = ['twelve_hour', 'hygiene', 'ppe'] as const;
export const vaccinationCheckKinds = ['flock_health', 'withdrawal', 'water_treatments', 'heat', 'battery', 'enough_vaccine'] as const;
export const readinessKinds = [...memberCheckKinds, ...vaccinationCheckKinds] as const;

/** The vaccination's checks for its route: the sprayer's battery matters only when a sprayer is used. */
export function vaccinationCheckKindsFor(route: string): readonly VaccinationCheckKind[] {
  return route === 'spray' ? vaccinationCheckKinds : vaccinationCheckKinds.filter((kind) => kind !== 'battery');
}

export type MemberCheckKind = (typeof memberCheckKinds)[number];
export type VaccinationCheckKind = (typeof vaccinationCheckKinds)[number];
export type ReadinessKind = (typeof readinessKinds)[number];

export const readinessLabels: Record<ReadinessKind, string> = {
  twelve_hour: 'No other farm in the 12 hours before the first visit',
  hygiene: 'Showered, freshly washed clothes, sanitized boots or boot covers',
  ppe: 'Protective equipment: hairnet, mask, eye protection, gloves, long sleeves, boots',
  flock_health: 'Flock healthy enough to vaccinate',
  withdrawal: "Outside the product's withdrawal period before depletion",
  water_treatments: 'Water medication and sanitizers suspended',
  heat: 'Expected temperature within the site limit',
  battery: 'Sprayer battery fully charged',
  enough_vaccine: 'Enough vaccine and equipment for the whole flock',
};

/** The statements a person confirms for each attested check; every one must be true for the check to pass. */
export const attestations: Partial<Record<ReadinessKind, Record<string, string>>> = {
  hygiene: { showered: 'Showered', cleanClothes: 'Freshly washed clothes', bootsSanitized: 'Sanitized boots or boot covers' },
  ppe: { hairnet: 'Hairnet', mask: 'Mask', eyeProtection: 'Eye protection', gloves: 'Gloves', longSleeves: 'Long sleeves', boots: 'Boots' },
  flock_health: { healthy: 'Birds look healthy; no disease signs reported' },
  water_treatments: { suspended: 'Water medication and sanitizers suspended before and during vaccination' },
  battery: { charged: 'Battery fully charged' },
  enough_vaccine: { equipmentAssembled: 'Equipment assembled and enough vaccine to finish without a break' },
};
