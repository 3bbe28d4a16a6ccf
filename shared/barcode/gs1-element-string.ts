// Raw GS1 element strings as a scanner sends them: AIs run together, variable-length values end at GS.
import { BarcodeError } from './barcode-error.js';
import { gs1AiLength } from './gs1-ai-length.js';
import { requireGs1Ai } from './gs1-application-identifiers.js';
import type { Gs1Element } from './gs1-element.js';

/** ASCII 29, how scanners transmit the FNC1 that ends a variable-length field. */
export const GROUP_SEPARATOR = '\u001d';

function excerpt(text: string): string {
  return JSON.stringify(text.length > 20 ? `${text.slice(0, 20)}...` : text);
}

/** Splits `data` into AI/value pairs; values are not validated here beyond what splitting needs. */
export function parseGs1ElementString(data: string): Gs1Element[] {
  const elements: Gs1Element[] = [];
  let position = 0;
  while (position < data.length) {
    // A leading FNC1, or one after a fixed-length field, carries no information; skipping it is harmless.
    if (data[position] === GROUP_SEPARATOR) {
      position++;
      continue;
    }
    const rest = data.slice(position);
    const where = ` at character ${position + 1}`;
    const aiLength = gs1AiLength(rest);
    if (aiLength === undefined) {
      if (/^\d\d/.test(rest)) throw new BarcodeError(`unknown application identifier (${rest.slice(0, 2)})${where}`);
      throw new BarcodeError(`expected an application identifier${where}, found ${excerpt(rest)}`);
    }
    const ai = rest.slice(0, aiLength);
    if (!new RegExp(`^\\d{${aiLength}}$`).test(ai)) {
      throw new BarcodeError(`incomplete application identifier ${excerpt(ai)}${where}`);
    }
    const definition = requireGs1Ai(ai, where);
    const label = `(${ai}) ${definition.title}`;
    const valueStart = position + aiLength;
    if (definition.fixedLength) {
      const value = data.slice(valueStart, valueStart + definition.maxLength);
      const separatorAt = value.indexOf(GROUP_SEPARATOR);
      const present = separatorAt >= 0 ? value.slice(0, separatorAt) : value;
      if (present.length < definition.maxLength) {
        throw new BarcodeError(
          `${label} is cut short: it needs ${definition.maxLength} characters but has ${present.length} (${JSON.stringify(present)})`,
        );
      }
      elements.push({ ai, value });
      position = valueStart + definition.maxLength;
    } else {
      const separatorAt = data.indexOf(GROUP_SEPARATOR, valueStart);
      const valueEnd = separatorAt >= 0 ? separatorAt : data.length;
      const value = data.slice(valueStart, valueEnd);
      if (value.length > definition.maxLength) {
        // Usually a missing separator: the next AI was swallowed into this value.
        throw new BarcodeError(
          `${label} is ${value.length} characters long, the maximum is ${definition.maxLength} (is a GS separator missing after it?)`,
        );
      }
      elements.push({ ai, value });
      position = valueEnd;
    }
  }
  return elements;
}
