// What every step of the run shares: send one step, hand the new run up, put the server's errors beside the fields.
import { Directive, inject, input, output, signal } from '@angular/core';
import type { FormGroup } from '@angular/forms';
import { firstValueFrom } from 'rxjs';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { ApiError } from '../../core/http/api-error';
import { DayApi, type RunView } from '../../shared/vaccination-day/day-api';

@Directive()
export abstract class RunStep {
  readonly run = input.required<RunView>();
  readonly changed = output<RunView>();
  protected readonly api = inject(DayApi);
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly message = controlMessage;

  protected async send(path: string, body: object, form?: FormGroup): Promise<boolean> {
    if (form?.invalid) {
      form.markAllAsTouched();
      return false;
    }
    this.busy.set(true);
    this.error.set(null);
    try {
      this.changed.emit(await firstValueFrom(this.api.step(this.run().vaccinationId, path, body)));
      return true;
    } catch (error) {
      const apiError = ApiError.from(error);
      // Field errors go beside their fields; the whole reason (why a lot was refused, say) stays above the form.
      if (form) applyServerErrors(form, error);
      this.error.set(apiError.message);
      return false;
    } finally {
      this.busy.set(false);
    }
  }
}
