// Words that mark a column's purpose in English, Spanish, French, German and Dutch headers.

/** Lower case without accents, so `Température` and `temperature` match alike. */
export function normalizeHeader(text: string): string {
  return text.normalize('NFD').replace(/\p{M}/gu, '').toLowerCase().trim();
}

function words(header: string): string[] {
  return normalizeHeader(header).split(/[^a-z0-9%#]+/).filter(Boolean);
}

// Stems cover compounds such as `Luftfeuchtigkeit` or `luchtvochtigheid`.
const EXCLUDED_STEMS = [
  ...['humid', 'humed', 'feucht', 'vocht', '%'],
  ...['dew', 'rocio', 'rosee', 'taupunkt', 'dauwpunt'],
  ...['alarm', 'alert', 'status', 'estado', 'etat'],
  ...['batter', 'bateri', 'serial', 'serie', 'index', 'indice', '#'],
];
const EXCLUDED_WORDS = new Set(['rh', 'hr', 'id', 'no', 'nr', 'n', 'num', 'numero', 'nummer', 'flag', 'flags']);
const DATE_WORDS = new Set(['date', 'fecha', 'datum']);
const TIME_WORDS = new Set(['time', 'hora', 'heure', 'uhrzeit', 'zeit', 'tijd', 'tiempo']);
const DATE_TIME_WORDS = new Set(['timestamp', 'datetime', 'zeitstempel', 'horodatage', 'tijdstempel', 'tijdstip', 'marca']);

/** Humidity, alarms, serial numbers, row numbers: numeric columns that are never the temperature. */
export function isExcludedHeader(header: string): boolean {
  return words(header).some((w) => EXCLUDED_WORDS.has(w) || EXCLUDED_STEMS.some((stem) => w.includes(stem)));
}

/** `temp`, `temperature`, `temperatura`, `température`, `temperatur`, `temperatuur`, `temp_c`, ... */
export function isTemperatureHeader(header: string): boolean {
  return words(header).some((w) => w.startsWith('temp'));
}

/** 2 for a combined date-and-time header, 1 for a date or time word alone, 0 otherwise. */
export function dateTimeHeaderScore(header: string): number {
  const ws = words(header);
  const hasDate = ws.some((w) => DATE_WORDS.has(w));
  const hasTime = ws.some((w) => TIME_WORDS.has(w));
  if (ws.some((w) => DATE_TIME_WORDS.has(w)) || (hasDate && hasTime)) return 2;
  return hasDate || hasTime ? 1 : 0;
}

export function isDateHeader(header: string): boolean {
  return words(header).some((w) => DATE_WORDS.has(w));
}

export function isTimeOfDayHeader(header: string): boolean {
  return words(header).some((w) => TIME_WORDS.has(w));
}
