// A flock's vaccination history as CSV (RFC 4180 quoting; a leading =, +, - or @ is defused so a spreadsheet never runs it).
export interface HistoryRow {
  date: string;
  product: string;
  route: string;
  ageDays: number;
  birdsVaccinated: number;
  lots: { lotNumber: string; vialsUsed: number; dosesUsed: number; vialsReturned: number }[];
  startedAt: string;
  endedAt: string;
  crewLead: string;
  crew: string[];
  deviations: string;
  signedAt: string;
}

export const historyCsvHeader = ['date', 'product', 'route', 'age_days', 'birds_vaccinated', 'lots', 'vials_used', 'doses_used', 'vials_returned', 'started_at', 'ended_at', 'crew_lead', 'crew', 'deviations', 'signed_at'];

export function csvField(value: string | number): string {
  let text = String(value);
  if (typeof value === 'string' && /^[=+\-@\t\r]/.test(text)) text = `'${text}`;
  return /[",\r\n]/.test(text) ? `"${text.replace(/"/g, '""')}"` : text;
}

export function historyCsv(rows: readonly HistoryRow[]): string {
  const lines = rows.map((r) =>
    [
      r.date, r.product, r.route, r.ageDays, r.birdsVaccinated,
      r.lots.map((l) => l.lotNumber).join('; '),
      r.lots.reduce((s, l) => s + l.vialsUsed, 0),
      r.lots.reduce((s, l) => s + l.dosesUsed, 0),
      r.lots.reduce((s, l) => s + l.vialsReturned, 0),
      r.startedAt, r.endedAt, r.crewLead, r.crew.join('; '), r.deviations, r.signedAt,
    ].map(csvField).join(','),
  );
  return [historyCsvHeader.join(','), ...lines].join('\r\n') + '\r\n';
}
