// The troubleshooting record of an excursion, filled in by storage staff: what was found, what happened, what was done.
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { firstValueFrom } from 'rxjs';
import type { TroubleshootingView } from '@shared/lots/exposure-event-view.js';
import { fromCelsius, type TemperatureUnit } from '@shared/temperature/index.js';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { ApiError } from '../../core/http/api-error';
import { ReviewApi } from './review-api';

export interface TroubleshootingDialogData {
  eventId: number;
  title: string;
  record: TroubleshootingView | null;
  unit: TemperatureUnit;
}

/** "YYYY-MM-DDTHH:mm" on the browser's clock, as a datetime-local field shows it. */
function localInput(iso: string | null): string {
  if (!iso) return '';
  const d = new Date(iso);
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}T${pad(d.getHours())}:${pad(d.getMinutes())}`;
}

const toIso = (local: string) => (local ? new Date(local).toISOString() : null);
// A number field hands the form a number (or null when empty), whatever the control was created with.
const toNumber = (value: string | number | null) => (value === null || String(value).trim() === '' ? null : Number(value));

@Component({
  selector: 'vy-troubleshooting-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatRadioModule, MatButtonModule],
  templateUrl: './troubleshooting-dialog.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
  styles: `.content { display: grid; grid-template-columns: repeat(auto-fill, minmax(200px, 1fr)); gap: 4px 12px; } .wide { grid-column: 1 / -1; }`,
})
export class TroubleshootingDialog {
  protected readonly data = inject<TroubleshootingDialogData>(MAT_DIALOG_DATA);
  private readonly api = inject(ReviewApi);
  private readonly dialogRef = inject(MatDialogRef<TroubleshootingDialog, boolean>);
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  private readonly unit = this.data.record?.enteredUnit ?? this.data.unit;
  private readonly temp = (c: number | null | undefined) => (c == null ? '' : String(Number(fromCelsius(c, this.unit).toFixed(1))));

  protected readonly form = inject(NonNullableFormBuilder).group({
    unit: [this.unit as TemperatureUnit],
    foundAt: [localInput(this.data.record?.foundAt ?? null)],
    foundBy: [this.data.record?.foundBy ?? ''],
    unitTemp: [this.temp(this.data.record?.unitTempC)],
    unitMin: [this.temp(this.data.record?.unitMinC)],
    unitMax: [this.temp(this.data.record?.unitMaxC)],
    roomTemp: [this.temp(this.data.record?.roomTempC)],
    whatHappened: [this.data.record?.whatHappened ?? ''],
    minutesSinceInRange: [this.data.record?.minutesSinceInRange == null ? '' : String(this.data.record.minutesSinceInRange)],
    backInStorageAt: [localInput(this.data.record?.backInStorageAt ?? null)],
    contacted: [this.data.record?.contacted ?? ''],
    preventiveAction: [this.data.record?.preventiveAction ?? ''],
  });

  protected async save(): Promise<void> {
    const v = this.form.getRawValue();
    this.saving.set(true);
    this.formError.set(null);
    try {
      await firstValueFrom(this.api.saveTroubleshooting(this.data.eventId, {
        unit: v.unit,
        foundAt: toIso(v.foundAt),
        foundBy: v.foundBy,
        unitTemp: toNumber(v.unitTemp),
        unitMin: toNumber(v.unitMin),
        unitMax: toNumber(v.unitMax),
        roomTemp: toNumber(v.roomTemp),
        whatHappened: v.whatHappened,
        minutesSinceInRange: toNumber(v.minutesSinceInRange),
        backInStorageAt: toIso(v.backInStorageAt),
        contacted: v.contacted,
        preventiveAction: v.preventiveAction,
      }));
      this.dialogRef.close(true);
    } catch (error) {
      this.formError.set(applyServerErrors(this.form, error) ?? (ApiError.from(error).fields.length ? null : ApiError.from(error).message));
    } finally {
      this.saving.set(false);
    }
  }
}
