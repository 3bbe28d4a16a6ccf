// The one-line reason an automatic hold carries: which fridge, which side of which range, how far and how long.
import { formatRange } from '../../shared/exposure/exposure-event-title.js';
import { celsiusToFahrenheit } from '../../shared/temperature/convert-temperature.js';

/** A peak in the unit the product's range is written in, so one sentence never mixes °F and °C. */
function peakText(peakC: number, unit: 'F' | 'C'): string {
  return unit === 'F' ? `${celsiusToFahrenheit(peakC).toFixed(1)} °F` : `${peakC.toFixed(1)} °C`;
}

export function exposureReason(input: {
  cause: 'excursion' | 'freeze';
  kind: 'high' | 'low';
  fridgeName: string;
  range: { low: number; high: number; unit: 'F' | 'C' };
  peakC: number;
  minutes: number | null;
}): string {
  const duration = input.minutes === null ? 'seen at a daily check' : `for ${Math.round(input.minutes).toLocaleString('en-US')} min`;
  if (input.cause === 'freeze') {
    return `${input.fridgeName} read at or below 0 °C (lowest ${input.peakC.toFixed(1)} °C) ${duration}; the product must not freeze.`;
  }
  const side = input.kind === 'high' ? 'above' : 'below';
  const peak = input.kind === 'high' ? 'highest' : 'lowest';
  return `${input.fridgeName} read ${side} the product's range ${formatRange(input.range)} ${duration} (${peak} ${peakText(input.peakC, input.range.unit)}).`;
}
