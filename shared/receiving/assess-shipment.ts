// Reads a shipment as recorded at the door: its discrepancies, its warnings, the lots to hold on arrival, the outcome to suggest.
import { classifyTemperatureC, rangeInCelsius, toCelsius, type TemperatureRange } from '../temperature/index.js';
import type { ArrivalChecks, ShipmentOutcome } from './arrival-checks.js';
import { lineDifference, type LineCounts } from './line-counts.js';
import { TRANSIT_LIMIT_HOURS, transitHours } from './transit-hours.js';

export interface AssessedLine extends LineCounts {
  presentationId: number;
  lotNumber: string;
  expiry: string;
  accepted: boolean;
  storedAt: string | null;
}

export interface AssessedShipment {
  arrivedAt: string;
  shippedAt: string | null;
  checks: ArrivalChecks;
  reading: { value: number; unit: 'F' | 'C' } | null;
  outcome: ShipmentOutcome;
  lines: AssessedLine[];
}

/** What the assessment needs to know about each line's product: its name and its label's storage range. */
export interface ProductRangeInfo {
  productName: string;
  range: TemperatureRange;
}

export type DiscrepancyKind =
  | 'container_damaged'
  | 'coolant_missing'
  | 'indicator_triggered'
  | 'not_cold'
  | 'reading_out_of_range'
  | 'broken'
  | 'missing'
  | 'count_mismatch'
  | 'line_refused'
  | 'shipment_refused';

export type WarningKind = 'transit_long' | 'stored_late' | 'expired' | 'no_reading';

export interface Finding<K> {
  kind: K;
  /** The line's index, for line findings. */
  line: number | null;
  message: string;
}

export interface ShipmentAssessment {
  discrepancies: Finding<DiscrepancyKind>[];
  warnings: Finding<WarningKind>[];
  /** Lines whose lots enter stock on hold, with why. */
  arrivalHolds: { line: number; reasons: string[] }[];
  suggestedOutcome: ShipmentOutcome;
  /** A discrepancy report is due: damage, shortage, warm arrival or refusal. */
  needsReport: boolean;
  transitHours: number | null;
  /** Why the chosen outcome does not fit, or null. */
  outcomeProblem: string | null;
}

function formatTemperature(value: number, unit: 'F' | 'C'): string {
  return `${Number(value.toFixed(1))} °${unit}`;
}

function formatRange(range: TemperatureRange): string {
  return `${range.low}–${range.high} °${range.unit}`;
}

/** A line brings vials into stock only when the shipment is not refused and the line itself is accepted. */
export function lineTakesStock(outcome: ShipmentOutcome, line: { accepted: boolean; vialsIntact: number }): boolean {
  return outcome !== 'refused' && line.accepted && line.vialsIntact > 0;
}

function readingProblem(shipment: AssessedShipment, info: ProductRangeInfo | undefined): string | null {
  if (!shipment.reading || !info) return null;
  const side = classifyTemperatureC(toCelsius(shipment.reading.value, shipment.reading.unit), rangeInCelsius(info.range));
  if (side === 'in') return null;
  return `reading ${formatTemperature(shipment.reading.value, shipment.reading.unit)} is ${side === 'high' ? 'above' : 'below'} ${info.productName}'s label range ${formatRange(info.range)}`;
}

function checkFindings(shipment: AssessedShipment): Finding<DiscrepancyKind>[] {
  const { checks } = shipment;
  const found: Finding<DiscrepancyKind>[] = [];
  if (!checks.containerIntact) found.push({ kind: 'container_damaged', line: null, message: 'The outer container is damaged.' });
  if (!checks.coolantPresent) found.push({ kind: 'coolant_missing', line: null, message: 'No coolant in the box.' });
  if (checks.indicator === 'triggered') found.push({ kind: 'indicator_triggered', line: null, message: 'The temperature indicator is triggered.' });
  if (!checks.contentsCold) found.push({ kind: 'not_cold', line: null, message: 'The contents were not cold.' });
  return found;
}

function lineFindings(shipment: AssessedShipment, index: number, label: string): Finding<DiscrepancyKind>[] {
  const line = shipment.lines[index]!;
  const difference = lineDifference(line);
  const found: Finding<DiscrepancyKind>[] = [];
  if (difference.broken > 0) found.push({ kind: 'broken', line: index, message: `${label}: ${difference.broken} vial(s) broken or damaged.` });
  if (difference.missing > 0) found.push({ kind: 'missing', line: index, message: `${label}: ${difference.missing} vial(s) missing.` });
  if (difference.unaccounted !== 0) {
    const counted = line.vialsIntact + line.vialsBroken + line.vialsMissing;
    found.push({ kind: 'count_mismatch', line: index, message: `${label}: ${counted} vial(s) counted against ${line.vialsExpected} expected.` });
  }
  if (shipment.outcome !== 'refused' && !line.accepted) found.push({ kind: 'line_refused', line: index, message: `${label}: refused.` });
  return found;
}

export function assessShipment(
  shipment: AssessedShipment,
  products: ReadonlyMap<number, ProductRangeInfo>,
  options: { storeWithinMinutes: number },
): ShipmentAssessment {
  const discrepancies = checkFindings(shipment);
  const warnings: Finding<WarningKind>[] = [];
  const arrivalHolds: ShipmentAssessment['arrivalHolds'] = [];
  const warmMessages = new Set<string>();
  const arrivalDay = shipment.arrivedAt.slice(0, 10);

  shipment.lines.forEach((line, index) => {
    const info = products.get(line.presentationId);
    const label = `Lot ${line.lotNumber}`;
    discrepancies.push(...lineFindings(shipment, index, label));
    const warm = readingProblem(shipment, info);
    if (warm) warmMessages.add(warm);
    if (line.expiry < arrivalDay) warnings.push({ kind: 'expired', line: index, message: `${label} expired on ${line.expiry}.` });
    if (line.storedAt) {
      const minutes = (Date.parse(line.storedAt) - Date.parse(shipment.arrivedAt)) / 60_000;
      if (minutes > options.storeWithinMinutes) {
        warnings.push({ kind: 'stored_late', line: index, message: `${label} went into the fridge ${Math.round(minutes)} min after arrival (the site asks within ${options.storeWithinMinutes} min).` });
      }
    }
    if (!lineTakesStock(shipment.outcome, line)) return;
    const reasons = [
      ...(warm ? [`The ${warm}.`] : []),
      ...(shipment.checks.indicator === 'triggered' ? ['The temperature indicator was triggered.'] : []),
      ...(!shipment.checks.contentsCold ? ['The contents were not cold on arrival.'] : []),
    ];
    if (reasons.length) arrivalHolds.push({ line: index, reasons });
  });

  for (const message of warmMessages) {
    discrepancies.push({ kind: 'reading_out_of_range', line: null, message: `The ${message}.` });
  }
  if (shipment.outcome === 'refused') discrepancies.push({ kind: 'shipment_refused', line: null, message: 'The shipment was refused.' });

  const hours = transitHours(shipment.shippedAt, shipment.arrivedAt);
  if (hours !== null && hours > TRANSIT_LIMIT_HOURS) {
    warnings.push({ kind: 'transit_long', line: null, message: `In transit ${Math.round(hours)} h, over the ${TRANSIT_LIMIT_HOURS} h guidance allows.` });
  }
  if (!shipment.reading) warnings.push({ kind: 'no_reading', line: null, message: 'No temperature reading was recorded.' });

  const suggestedOutcome: ShipmentOutcome =
    shipment.outcome === 'refused' ? 'refused' : discrepancies.length ? 'accepted_with_discrepancies' : 'accepted';
  return {
    discrepancies,
    warnings,
    arrivalHolds,
    suggestedOutcome,
    needsReport: discrepancies.length > 0,
    transitHours: hours,
    outcomeProblem: outcomeProblem(shipment, discrepancies.length > 0),
  };
}

function outcomeProblem(shipment: AssessedShipment, hasDiscrepancies: boolean): string | null {
  if (shipment.outcome === 'accepted' && hasDiscrepancies) {
    return 'This shipment has discrepancies: choose "accepted with discrepancies", or refuse it.';
  }
  if (shipment.outcome !== 'refused' && !shipment.lines.some((line) => lineTakesStock(shipment.outcome, line))) {
    return 'No line brings intact vials into stock: refuse the shipment instead.';
  }
  return null;
}
