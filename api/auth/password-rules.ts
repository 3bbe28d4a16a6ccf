// Refuses a new password that breaks the policy, naming the field so the page can show it beside the input.
import { passwordShapeProblem, type PasswordContext } from '../../shared/auth/password-policy.js';
import { AppError } from '../http/app-error.js';
import { isCommonPassword } from './common-passwords.js';

export function assertAcceptablePassword(password: string, context: PasswordContext, field = 'password'): void {
  const problem = passwordShapeProblem(password, context)
    ?? (isCommonPassword(password) ? 'This password is on a list of commonly used passwords; choose another.' : null);
  if (problem) throw AppError.badRequest(problem, [{ field, message: problem }]);
}
