// The GS1 mod-10 check digit shared by every numeric GS1 key (GTIN, SSCC, ...).
import { BarcodeError } from './barcode-error.js';

/** Check digit for `body` (the key without its last digit): weights 3,1,3,1,... from the right. */
export function gs1CheckDigit(body: string): number {
  if (!/^\d+$/.test(body)) {
    throw new BarcodeError(`a check digit can only be computed over digits, got ${JSON.stringify(body)}`);
  }
  let sum = 0;
  for (let i = 0; i < body.length; i++) {
    const digit = body.charCodeAt(body.length - 1 - i) - 48;
    sum += i % 2 === 0 ? digit * 3 : digit;
  }
  return (10 - (sum % 10)) % 10;
}

/** True when the last digit of an all-digit `key` matches the check digit of the rest. */
export function hasValidGs1CheckDigit(key: string): boolean {
  if (!/^\d{2,}$/.test(key)) return false;
  return gs1CheckDigit(key.slice(0, -1)) === Number(key.slice(-1));
}
