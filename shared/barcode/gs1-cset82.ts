// GS1 AI encodable character set 82, the characters allowed in alphanumeric AIs such as lot and serial.
const CSET82 = new Set("!\"%&'()*+,-./0123456789:;<=>?ABCDEFGHIJKLMNOPQRSTUVWXYZ_abcdefghijklmnopqrstuvwxyz");

/** The first character of `text` outside set 82, or undefined when every character is allowed. */
export function findNonCset82Character(text: string): string | undefined {
  for (const character of text) {
    if (!CSET82.has(character)) return character;
  }
  return undefined;
}
