// Public surface of the GS1 barcode module, shared by the API, the CLI and the browser client.
export { BarcodeError } from './barcode-error.js';
export { parseBarcode, type ParsedBarcode } from './parse-barcode.js';
export { gtinCheckDigit, isValidGtin, normalizeGtin, GTIN_LENGTHS } from './gtin.js';
export { gs1CheckDigit, hasValidGs1CheckDigit } from './gs1-check-digit.js';
export { parseGs1Date, type Gs1Date } from './gs1-date.js';
export { applyGs1CenturyRule } from './gs1-century-rule.js';
export { findGs1Ai, type Gs1AiDefinition } from './gs1-application-identifiers.js';
export type { Gs1Element } from './gs1-element.js';
