// The troubleshooting record of an excursion, filled in by storage staff: what was found, what happened, what was done.
// Its times are typed and shown on the clock of the fridge's site.
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { firstValueFrom } from 'rxjs';
import type { TroubleshootingView } from '@shared/lots/exposure-event-view.js';
import { siteWallTime, siteWallTimeToInstant } from '@shared/sites/site-clock.js';
import { fromCelsius, type TemperatureUnit } from '@shared/temperature/index.js';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { ApiError } from '../../core/http/api-error';
import { siteClockHint } from '../../shared/sites/site-clock-hint';
import { readerTimeZone } from '../../shared/sites/site-time-pipe';
import { ReviewApi } from './review-api';

export interface TroubleshootingDialogData {
  eventId: number;
  title: string;
  record: TroubleshootingView | null;
  unit: TemperatureUnit;
  /** The event's site's zone (null: the reader's own clock). */
  timeZone: string | null;
}
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
  private readonly zone = this.data.timeZone || readerTimeZone();
  /** "YYYY-MM-DDTHH:mm" on the site's clock, as a datetime-local field shows it. */
  private readonly wall = (iso: string | null) => (iso ? siteWallTime(iso, this.zone) : '');
  private readonly toIso = (wall: string) => (wall ? (siteWallTimeToInstant(wall, this.zone)?.toISOString() ?? null) : null);
  private readonly clock = this.data.timeZone ? "the site's clock" : 'your own clock';
  private readonly temp = (c: number | null | undefined) => (c == null ? '' : String(Number(fromCelsius(c, this.unit).toFixed(1))));

  protected readonly form = inject(NonNullableFormBuilder).group({
    unit: [this.unit as TemperatureUnit],
    foundAt: [this.wall(this.data.record?.foundAt ?? null)],
    foundBy: [this.data.record?.foundBy ?? ''],
    unitTemp: [this.temp(this.data.record?.unitTempC)],
    unitMin: [this.temp(this.data.record?.unitMinC)],
    unitMax: [this.temp(this.data.record?.unitMaxC)],
    roomTemp: [this.temp(this.data.record?.roomTempC)],
    whatHappened: [this.data.record?.whatHappened ?? ''],
    minutesSinceInRange: [this.data.record?.minutesSinceInRange == null ? '' : String(this.data.record.minutesSinceInRange)],
    backInStorageAt: [this.wall(this.data.record?.backInStorageAt ?? null)],
    contacted: [this.data.record?.contacted ?? ''],
    preventiveAction: [this.data.record?.preventiveAction ?? ''],
  });
  private readonly foundTyped = toSignal(this.form.controls.foundAt.valueChanges, { initialValue: this.form.controls.foundAt.value });
  private readonly backTyped = toSignal(this.form.controls.backInStorageAt.valueChanges, { initialValue: this.form.controls.backInStorageAt.value });
  protected readonly foundHint = () => siteClockHint(this.foundTyped(), this.zone, this.clock);
  protected readonly backHint = () => siteClockHint(this.backTyped(), this.zone, this.clock);

  protected async save(): Promise<void> {
    const v = this.form.getRawValue();
    this.saving.set(true);
    this.formError.set(null);
    try {
      await firstValueFrom(this.api.saveTroubleshooting(this.data.eventId, {
        unit: v.unit,
        foundAt: this.toIso(v.foundAt),
        foundBy: v.foundBy,
        unitTemp: toNumber(v.unitTemp),
        unitMin: toNumber(v.unitMin),
        unitMax: toNumber(v.unitMax),
        roomTemp: toNumber(v.roomTemp),
        whatHappened: v.whatHappened,
        minutesSinceInRange: toNumber(v.minutesSinceInRange),
        backInStorageAt: this.toIso(v.backInStorageAt),
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
