// Puts the server's field errors on the matching form controls, so each shows beside its field.
import type { AbstractControl, FormGroup } from '@angular/forms';
import { ApiError } from '../http/api-error';

/** Returns the message for errors that belong to no field (shown above the form). */
export function applyServerErrors(form: FormGroup, error: unknown): string | null {
  const apiError = ApiError.from(error);
  const unplaced: string[] = [];
  for (const { field, message } of apiError.fields) {
    const control: AbstractControl | null = form.get(field.split('.')[0]);
    if (control) {
      control.setErrors({ ...(control.errors ?? {}), server: message });
      control.markAsTouched();
    } else {
      unplaced.push(message);
    }
  }
  return apiError.fields.length === 0 ? apiError.message : unplaced.length ? unplaced.join(' ') : null;
}

/** The message to show under a control: the server's, else one for the first validator that failed. */
export function controlMessage(control: AbstractControl, messages: Record<string, string> = {}): string {
  const errors = control.errors;
  if (!errors) return '';
  if (typeof errors['server'] === 'string') return errors['server'];
  const key = Object.keys(errors)[0];
  return messages[key] ?? (key === 'required' ? 'Required.' : key === 'email' ? 'Enter an e-mail address.' : 'Not valid.');
}
