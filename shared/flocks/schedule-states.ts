// The states of a flock's schedule entry, with the words the screens show (no zod here: the client imports it).
// Planned, confirmed, done and cancelled are the vaccination's own status; the others are read from the dates.
export const scheduleStates = ['planned', 'confirmed', 'overdue', 'done', 'cancelled', 'missed', 'before_placement', 'after_depletion'] as const;
export type ScheduleState = (typeof scheduleStates)[number];

export const scheduleStateLabels: Record<ScheduleState, string> = {
  planned: 'Planned',
  confirmed: 'Confirmed',
  overdue: 'Overdue',
  done: 'Done',
  cancelled: 'Cancelled',
  missed: 'Missed',
  before_placement: 'Before placement',
  after_depletion: 'After depletion',
};

/** What each state means, in a sentence the flock page shows beside the entry. */
export const scheduleStateHints: Record<ScheduleState, string> = {
  planned: 'Planned; not yet confirmed for the day.',
  confirmed: 'Confirmed for the day.',
  overdue: 'Its day has passed and nothing is recorded: plan a new date or cancel it with a reason.',
  done: 'Given and signed.',
  cancelled: 'Cancelled.',
  missed: 'Its day passed before the flock left, with nothing recorded.',
  before_placement: 'Falls before placement: given at the hatchery or rearing farm, not here.',
  after_depletion: 'Falls on or after the flock leaves: not planned.',
};

