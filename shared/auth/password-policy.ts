// Password rules after NIST SP 800-63B-4: length, bcrypt's 72-byte reach, and words tied to the account.
export const passwordMinLength = 15;
/** bcrypt reads only the first 72 bytes; a longer password would be silently truncated. */
export const passwordMaxBytes = 72;

export interface PasswordContext {
  email?: string;
  name?: string;
}

function utf8Length(text: string): number {
  return new TextEncoder().encode(text).length;
}

/**
 * Returns the reason a password is refused, or null when its shape is acceptable.
 * The common-password check needs the dictionary and runs on the server only.
 */
export function passwordShapeProblem(password: string, context: PasswordContext = {}): string | null {
  const characters = [...password].length;
  if (characters < passwordMinLength) {
    return `Use at least ${passwordMinLength} characters (this one has ${characters}).`;
  }
  if (utf8Length(password) > passwordMaxBytes) {
    return `Use at most ${passwordMaxBytes} bytes: this one is ${utf8Length(password)} bytes in UTF-8 (letters with accents and emoji take 2–4 bytes each).`;
  }
  const lowered = password.toLowerCase();
  const personal = [context.email?.split('@')[0], context.name, 'vialyard']
    .filter((word): word is string => !!word && word.length >= 4)
    .map((word) => word.toLowerCase());
  if (personal.some((word) => lowered.includes(word) && lowered.length - word.length < 8)) {
    return 'Do not build the password around your name, e-mail or the product name.';
  }
  if (/^(.)\1+$/u.test(password)) return 'Do not repeat one character.';
  return null;
}
