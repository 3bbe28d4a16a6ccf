// One entry point for whatever a scanner or a person hands us: bracketed text, raw scan data, Digital Link or a bare GTIN.
import { BarcodeError } from './barcode-error.js';
import { parseGs1BracketedString } from './gs1-bracketed-string.js';
import { parseGs1Date } from './gs1-date.js';
import { parseGs1DigitalLink } from './gs1-digital-link.js';
import { validateGs1Element, type Gs1Element } from './gs1-element.js';
import { GROUP_SEPARATOR, parseGs1ElementString } from './gs1-element-string.js';
import { GTIN_LENGTHS, normalizeGtin } from './gtin.js';
import { splitSymbologyIdentifier } from './symbology-identifier.js';

export interface ParsedBarcode {
  /** 14 digits, check digit verified. */
  gtin: string | null;
  lot: string | null;
  /** YYYY-MM-DD; a label with day "00" gives the last day of the month. */
  expiry: string | null;
  /** False when the label gave only year and month; null without an expiry. */
  expiryDayGiven: boolean | null;
  serial: string | null;
  productionDate: string | null;
  /** Every AI found, with its value exactly as encoded. */
  ais: Record<string, string>;
}

function excerpt(text: string): string {
  return JSON.stringify(text.length > 30 ? `${text.slice(0, 30)}...` : text);
}

function readElements(input: string): Gs1Element[] {
  const { identifier, content, data } = splitSymbologyIdentifier(input);
  if (identifier !== null && data === '') throw new BarcodeError(`no data after symbology identifier ${identifier}`);
  if (content === 'uri' || (content === null && /^https?:\/\//i.test(data))) return parseGs1DigitalLink(data);
  const bareGtin = content === null && /^\d+$/.test(data) && GTIN_LENGTHS.includes(data.length);
  if (content === 'gtin' || bareGtin) return [{ ai: '01', value: normalizeGtin(data) }];
  if (content === null && data.startsWith('(')) return parseGs1BracketedString(data);
  // People typing scan data by hand write the invisible separator as "<GS>".
  const raw = data.replace(/<GS>/gi, GROUP_SEPARATOR);
  if (content === 'element-string' || /^[\d\u001d]/.test(raw)) return parseGs1ElementString(raw);
  throw new BarcodeError(
    `not a GS1 barcode: expected "(AI)value" text, raw scan data, a bare GTIN or a GS1 Digital Link URI, got ${excerpt(data)}`,
  );
}

function collectAis(elements: Gs1Element[], now: Date): Record<string, string> {
  const ais: Record<string, string> = {};
  for (const element of elements) {
    validateGs1Element(element, now);
    const previous = ais[element.ai];
    if (previous !== undefined && previous !== element.value) {
      throw new BarcodeError(`(${element.ai}) appears twice with different values: ${JSON.stringify(previous)} and ${JSON.stringify(element.value)}`);
    }
    ais[element.ai] = element.value;
  }
  return ais;
}

/**
 * Parses barcode data into the fields receiving needs; throws a BarcodeError saying what is wrong.
 * `now` anchors the GS1 century rule for two-digit years.
 */
export function parseBarcode(data: string, now: Date = new Date()): ParsedBarcode {
  // Keyboard-wedge scanners end with Enter; surrounding whitespace is never part of GS1 data.
  const input = data.trim();
  if (input === '') throw new BarcodeError('no barcode data: the input is empty');
  const ais = collectAis(readElements(input), now);
  if (Object.keys(ais).length === 0) throw new BarcodeError('no application identifiers found in the barcode data');
  const expiry = ais['17'] === undefined ? null : parseGs1Date(ais['17'], now);
  return {
    gtin: ais['01'] ?? null,
    lot: ais['10'] ?? null,
    expiry: expiry?.iso ?? null,
    expiryDayGiven: expiry?.dayGiven ?? null,
    serial: ais['21'] ?? null,
    productionDate: ais['11'] === undefined ? null : parseGs1Date(ais['11'], now).iso,
    ais,
  };
}
