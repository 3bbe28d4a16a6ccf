// Decides where a scanned carton goes on the receiving form: which line it fills, a new line, or a GTIN to propose.
import { BarcodeError, parseBarcode, type ParsedBarcode } from '../barcode/index.js';
import { findPresentationByGtin } from '../catalogue/find-presentation-by-gtin.js';
import type { ProductView } from '../catalogue/product-schemas.js';

export interface FormLine {
  presentationId: number | null;
  lotNumber: string;
}

export interface ScanFields {
  scan: string;
  lotNumber: string;
  /** As the form shows it: YYYY-MM-DD, or YYYY-MM when the label gives only month and year. */
  expiry: string;
}

export type ScanPlacement =
  | { kind: 'error'; message: string }
  | { kind: 'no-gtin'; message: string }
  | { kind: 'unknown-gtin'; gtin: string; fields: ScanFields }
  | { kind: 'fill'; line: number; presentationId: number; fields: ScanFields }
  | { kind: 'add'; presentationId: number; vialsExpected: number; fields: ScanFields }
  | { kind: 'already-listed'; line: number };

function fieldsOf(data: string, parsed: ParsedBarcode): ScanFields {
  const expiry = parsed.expiry === null ? '' : parsed.expiryDayGiven === false ? parsed.expiry.slice(0, 7) : parsed.expiry;
  return { scan: data.trim(), lotNumber: parsed.lot ?? '', expiry };
}

/**
 * A carton of a presentation the form already expects fills the first such line still without a lot;
 * the same lot scanned twice points at its line; anything else adds a line of one pack (or one vial).
 */
export function placeScan(data: string, lines: readonly FormLine[], products: readonly ProductView[], now = new Date()): ScanPlacement {
  let parsed: ParsedBarcode;
  try {
    parsed = parseBarcode(data, now);
  } catch (error) {
    return { kind: 'error', message: error instanceof BarcodeError ? `Could not read that barcode: ${error.message}.` : 'Could not read that barcode.' };
  }
  if (!parsed.gtin) return { kind: 'no-gtin', message: 'That barcode has no GTIN (01): scan the carton’s GS1 barcode, or choose the product by hand.' };
  const fields = fieldsOf(data, parsed);
  const match = findPresentationByGtin(products, parsed.gtin);
  if (!match) return { kind: 'unknown-gtin', gtin: parsed.gtin, fields };
  const presentationId = match.presentation.id;
  const same = (line: FormLine) => line.presentationId === presentationId;
  const listed = fields.lotNumber ? lines.findIndex((line) => same(line) && line.lotNumber.toUpperCase() === fields.lotNumber.toUpperCase()) : -1;
  if (listed >= 0) return { kind: 'already-listed', line: listed };
  const open = lines.findIndex((line) => same(line) && line.lotNumber.trim() === '');
  if (open >= 0) return { kind: 'fill', line: open, presentationId, fields };
  return { kind: 'add', presentationId, vialsExpected: match.level === 'pack' ? match.presentation.vialsPerPack : 1, fields };
}
