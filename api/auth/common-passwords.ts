// The common-password list (from @zxcvbn-ts/language-common), checked on the server when a password is set.
import { dictionary } from '@zxcvbn-ts/language-common';

const common = new Set((dictionary['passwords-common'] as string[]).map((word) => word.toLowerCase()));

/** True when the password, or the password without a trailing run of digits or symbols, is a common one. */
export function isCommonPassword(password: string): boolean {
  const lowered = password.toLowerCase();
  if (common.has(lowered)) return true;
  const stem = lowered.replace(/[\d\W_]+$/u, '');
  return stem.length >= 4 && stem !== lowered && common.has(stem);
}
