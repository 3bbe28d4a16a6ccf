// GS1 Digital Link URIs: AIs carried as path segments (/01/{gtin}/10/{lot}) and query parameters (?17=...).
import { BarcodeError } from './barcode-error.js';
import type { Gs1Element } from './gs1-element.js';

/** AIs that may open the identifier path; the path may have a custom prefix before them. */
const PRIMARY_KEYS = new Set(['00', '01']);
const NUMERIC_KEY = /^\d{2,4}$/;

function decode(component: string): string {
  try {
    return decodeURIComponent(component);
  } catch {
    throw new BarcodeError(`malformed percent-encoding in Digital Link component ${JSON.stringify(component)}`);
  }
}

function findPathStart(segments: string[]): number {
  for (let start = 0; start < segments.length; start++) {
    if (!PRIMARY_KEYS.has(segments[start] ?? '') || (segments.length - start) % 2 !== 0) continue;
    const keys = segments.filter((_, index) => index >= start && (index - start) % 2 === 0);
    if (keys.every((key) => NUMERIC_KEY.test(key))) return start;
  }
  return -1;
}

// The standard lets the path carry a GTIN-8/12/13 without leading zeros; element strings always use 14 digits.
function padGtin(ai: string, value: string): string {
  return ai === '01' && /^(\d{8}|\d{12}|\d{13})$/.test(value) ? value.padStart(14, '0') : value;
}

/** AI/value pairs from the path and query of `uri`; non-AI query parameters (e.g. linkType) are ignored. */
export function parseGs1DigitalLink(uri: string): Gs1Element[] {
  const match = /^https?:\/\/[^/?#]+(\/[^?#]*)?(?:\?([^#]*))?(?:#.*)?$/i.exec(uri);
  if (!match) throw new BarcodeError(`not a valid http(s) URI: ${JSON.stringify(uri)}`);
  const segments = (match[1] ?? '').split('/').slice(1);
  if (segments.at(-1) === '') segments.pop();
  const start = findPathStart(segments);
  if (start < 0) {
    throw new BarcodeError('not a GS1 Digital Link URI: the path has no GTIN (01) or SSCC (00) followed by AI/value pairs');
  }
  const elements: Gs1Element[] = [];
  for (let index = start; index < segments.length; index += 2) {
    const ai = segments[index] ?? '';
    elements.push({ ai, value: padGtin(ai, decode(segments[index + 1] ?? '')) });
  }
  for (const parameter of (match[2] ?? '').split('&')) {
    if (parameter === '') continue;
    const equals = parameter.indexOf('=');
    const key = decode(equals >= 0 ? parameter.slice(0, equals) : parameter);
    if (!/^\d+$/.test(key)) continue;
    elements.push({ ai: key, value: decode(equals >= 0 ? parameter.slice(equals + 1) : '') });
  }
  return elements;
}
