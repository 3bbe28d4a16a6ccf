// The human-readable "(01)...(17)...(10)..." form typed by hand or printed under a barcode.
import { BarcodeError } from './barcode-error.js';
import { requireGs1Ai } from './gs1-application-identifiers.js';
import type { Gs1Element } from './gs1-element.js';

/** Splits bracketed text into AI/value pairs; a literal "(" inside a value is written "\(". */
export function parseGs1BracketedString(text: string): Gs1Element[] {
  const elements: Gs1Element[] = [];
  let position = 0;
  while (position < text.length) {
    const match = /^\((\d+)\)/.exec(text.slice(position));
    if (!match || match[1] === undefined) {
      throw new BarcodeError(
        `expected "(AI)" at character ${position + 1}, found ${JSON.stringify(text.slice(position, position + 12))} (write a literal "(" in a value as "\\(")`,
      );
    }
    const ai = match[1];
    requireGs1Ai(ai, ` at character ${position + 1}`);
    position += match[0].length;
    let value = '';
    while (position < text.length && text[position] !== '(') {
      const escaped = text[position] === '\\' && text[position + 1] === '(';
      value += escaped ? '(' : text[position];
      position += escaped ? 2 : 1;
    }
    elements.push({ ai, value });
  }
  return elements;
}
