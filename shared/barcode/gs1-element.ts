// One AI and its value, and the format rules every input form (raw, bracketed, Digital Link) must pass.
import { BarcodeError } from './barcode-error.js';
import { hasValidGs1CheckDigit, gs1CheckDigit } from './gs1-check-digit.js';
import { findNonCset82Character } from './gs1-cset82.js';
import { parseGs1Date } from './gs1-date.js';
import { requireGs1Ai, type Gs1AiDefinition } from './gs1-application-identifiers.js';

export interface Gs1Element {
  readonly ai: string;
  readonly value: string;
}

/** Throws a BarcodeError naming the AI and the fault; returns the definition the value satisfied. */
export function validateGs1Element(element: Gs1Element, now: Date): Gs1AiDefinition {
  const definition = requireGs1Ai(element.ai);
  const { value } = element;
  const label = `(${definition.ai}) ${definition.title}`;
  if (value.length === 0) throw new BarcodeError(`${label} is empty`);
  if (definition.fixedLength && value.length !== definition.maxLength) {
    throw new BarcodeError(`${label} must be exactly ${definition.maxLength} digits, got ${value.length} (${JSON.stringify(value)})`);
  }
  if (!definition.fixedLength && value.length > definition.maxLength) {
    throw new BarcodeError(`${label} is ${value.length} characters long, the maximum is ${definition.maxLength}`);
  }
  if (definition.charset === 'numeric') {
    const position = value.search(/\D/);
    if (position >= 0) {
      throw new BarcodeError(`${label} must contain only digits, found ${JSON.stringify(value[position])} in ${JSON.stringify(value)}`);
    }
  } else {
    const bad = findNonCset82Character(value);
    if (bad !== undefined) {
      throw new BarcodeError(`${label} contains ${JSON.stringify(bad)}, which is not in the GS1 AI encodable character set 82`);
    }
  }
  if (definition.checkDigit && !hasValidGs1CheckDigit(value)) {
    throw new BarcodeError(`${label} ${value} has a wrong check digit: it should end in ${gs1CheckDigit(value.slice(0, -1))}`);
  }
  if (definition.date) {
    try {
      parseGs1Date(value, now);
    } catch (error) {
      if (error instanceof BarcodeError) throw new BarcodeError(`${label} is not a valid date: ${error.message}`);
      throw error;
    }
  }
  return definition;
}
