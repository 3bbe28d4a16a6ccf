// The "]Xn" prefix a scanner may put before the data, which says what kind of data follows.
import { BarcodeError } from './barcode-error.js';

export type SymbologyContent = 'element-string' | 'gtin' | 'uri';

const CONTENT_BY_IDENTIFIER: Readonly<Record<string, SymbologyContent>> = {
  ']C1': 'element-string', // GS1-128
  ']e0': 'element-string', // GS1 DataBar
  ']d2': 'element-string', // GS1 DataMatrix
  ']Q3': 'element-string', // GS1 QR Code
  ']J1': 'element-string', // GS1 DotCode
  ']E0': 'gtin', // EAN-13, UPC-A
  ']E4': 'gtin', // EAN-8
  ']d1': 'uri', // plain Data Matrix, as used for GS1 Digital Link
  ']Q1': 'uri', // plain QR Code, as used for GS1 Digital Link
};

export interface SymbologySplit {
  /** Null when the data had no symbology identifier. */
  identifier: string | null;
  content: SymbologyContent | null;
  data: string;
}

/** Separates a leading symbology identifier from the data; an identifier Vialyard cannot read is an error. */
export function splitSymbologyIdentifier(data: string): SymbologySplit {
  if (!data.startsWith(']')) return { identifier: null, content: null, data };
  const identifier = data.slice(0, 3);
  const content = CONTENT_BY_IDENTIFIER[identifier];
  if (content === undefined) {
    throw new BarcodeError(`unsupported symbology identifier ${JSON.stringify(identifier)}: expected one of ${Object.keys(CONTENT_BY_IDENTIFIER).join(', ')}`);
  }
  return { identifier, content, data: data.slice(3) };
}
