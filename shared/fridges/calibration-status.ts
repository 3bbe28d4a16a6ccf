// Whether a logger's calibration is current: storage staff are reminded 60 days before recalibration is due.

/** Guidance asks for recalibration every 2–3 years; the reminder comes this long before the due date. */
export const CALIBRATION_REMINDER_DAYS = 60;

export type CalibrationStatus = 'ok' | 'due-soon' | 'overdue' | 'none';

/** Dates as YYYY-MM-DD (the due date on the certificate, today's date at the site). */
export function calibrationStatus(dueOn: string | null, today: string): CalibrationStatus {
  if (dueOn === null) return 'none';
  if (dueOn < today) return 'overdue';
  const days = (Date.parse(`${dueOn}T00:00:00Z`) - Date.parse(`${today}T00:00:00Z`)) / 86_400_000;
  return days <= CALIBRATION_REMINDER_DAYS ? 'due-soon' : 'ok';
}
