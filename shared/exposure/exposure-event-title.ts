// How an exposure event is named in the queue, the report and notifications (the same words everywhere).
export interface EventTitleInput {
  cause: 'excursion' | 'freeze';
  kind: 'high' | 'low';
  source: 'readings' | 'daily_check';
  fridgeName: string;
  lowC: number;
  highC: number;
  /** Whether the fridge's own alarm range also showed it (a narrower product range can be crossed with no fridge alarm). */
  fridgeAlarmed: boolean;
}

const trim = (n: number) => String(Number(n.toFixed(1)));

export function formatRange(range: { low: number; high: number; unit: 'F' | 'C' }): string {
  return `${trim(range.low)}–${trim(range.high)} °${range.unit}`;
}

const toF = (c: number) => (c * 9) / 5 + 32;

/**
 * The title names the range in both scales (°C first, as stored): it is read in the queue, the report and mails by
 * people who set either unit.
 */
export function exposureEventTitle(input: EventTitleInput): string {
  const where = input.source === 'daily_check' ? `${input.fridgeName}, daily check` : input.fridgeName;
  if (input.cause === 'freeze') return `${where}: at or below 0 °C / 32 °F (freeze-sensitive products)`;
  const side = input.kind === 'high' ? 'above' : 'below';
  const range = `${trim(input.lowC)}–${trim(input.highC)} °C / ${trim(toF(input.lowC))}–${trim(toF(input.highC))} °F`;
  const alarm = input.fridgeAlarmed ? '' : ' (inside the fridge\'s alarm range: product range only)';
  return `${where}: ${side} product range ${range}${alarm}`;
}
