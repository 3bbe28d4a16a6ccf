// The GS1 Application Identifiers Vialyard reads, with the format rules of each.
import { BarcodeError } from './barcode-error.js';

export interface Gs1AiDefinition {
  readonly ai: string;
  /** GS1 data title, used in messages. */
  readonly title: string;
  readonly charset: 'numeric' | 'cset82';
  /** Fixed-length AIs need no separator after them in raw data; variable ones end at GS or end of data. */
  readonly fixedLength: boolean;
  /** Exact length when fixed, upper bound otherwise. */
  readonly maxLength: number;
  readonly checkDigit: boolean;
  readonly date: boolean;
}

function fixed(ai: string, title: string, length: number, extra: Partial<Gs1AiDefinition> = {}): Gs1AiDefinition {
  return { ai, title, charset: 'numeric', fixedLength: true, maxLength: length, checkDigit: false, date: false, ...extra };
}

function variable(ai: string, title: string, charset: Gs1AiDefinition['charset'], maxLength: number): Gs1AiDefinition {
  return { ai, title, charset, fixedLength: false, maxLength, checkDigit: false, date: false };
}

const DEFINITIONS: readonly Gs1AiDefinition[] = [
  fixed('00', 'SSCC', 18, { checkDigit: true }),
  fixed('01', 'GTIN', 14, { checkDigit: true }),
  fixed('02', 'CONTENT', 14, { checkDigit: true }),
  variable('10', 'BATCH/LOT', 'cset82', 20),
  fixed('11', 'PROD DATE', 6, { date: true }),
  fixed('13', 'PACK DATE', 6, { date: true }),
  fixed('15', 'BEST BEFORE or BEST BY', 6, { date: true }),
  fixed('17', 'USE BY or EXPIRY', 6, { date: true }),
  variable('21', 'SERIAL', 'cset82', 20),
  variable('30', 'VAR. COUNT', 'numeric', 8),
  variable('37', 'COUNT', 'numeric', 8),
  variable('240', 'ADDITIONAL ID', 'cset82', 30),
  variable('241', 'CUST. PART No.', 'cset82', 30),
  variable('250', 'SECONDARY SERIAL', 'cset82', 30),
  variable('400', 'ORDER NUMBER', 'cset82', 30),
];

const BY_AI = new Map(DEFINITIONS.map((definition) => [definition.ai, definition]));

/** The definition of `ai`, or undefined when Vialyard does not support it. */
export function findGs1Ai(ai: string): Gs1AiDefinition | undefined {
  return BY_AI.get(ai);
}

/** Like findGs1Ai, but an unsupported AI is a BarcodeError; `where` adds position context to the message. */
export function requireGs1Ai(ai: string, where = ''): Gs1AiDefinition {
  const definition = findGs1Ai(ai);
  if (!definition) throw new BarcodeError(`unknown application identifier (${ai})${where}`);
  return definition;
}
