// A vaccination's states, with the words the screens show (no zod here: the client imports it).
export const vaccinationStatuses = ['planned', 'confirmed', 'done', 'cancelled'] as const;
export type VaccinationStatus = (typeof vaccinationStatuses)[number];

export const vaccinationStatusLabels: Record<VaccinationStatus, string> = {
  planned: 'Planned',
  confirmed: 'Confirmed',
  done: 'Done',
  cancelled: 'Cancelled',
};
