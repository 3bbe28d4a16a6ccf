// Create or change a site: code, name, time zone and every setting, grouped by who it serves; server field errors beside each field.
import { ChangeDetectionStrategy, Component, ElementRef, computed, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatAutocompleteModule } from '@angular/material/autocomplete';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { firstValueFrom } from 'rxjs';
import type { SiteInput, SiteView } from '@shared/sites/site-schemas.js';
import { fromCelsius, toCelsius } from '@shared/temperature/index.js';
import { AuthStore } from '../../core/auth/auth-store';
import { applyServerErrors } from '../../core/forms/server-errors';
import { ApiError } from '../../core/http/api-error';
import { SitesApi } from '../../core/sites/sites-api';
import { heatLimitF, settingDefaults, settingLimits, type NumericSetting } from './site-setting-limits';
import { dayListValidator, fieldMessage, parseDayList, rangeText, settingValidator, siteCodeValidator, siteNameValidator, timeZoneValidator } from './site-validators';

/** A °F value in the user's unit, to a tenth. */
const inUnit = (f: number, unit: 'F' | 'C') => Math.round(fromCelsius(toCelsius(f, 'F'), unit) * 10) / 10;
const allZones = Intl.supportedValuesOf('timeZone');

@Component({
  selector: 'vy-site-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatButtonModule, MatAutocompleteModule],
  templateUrl: './site-dialog.html',
  styleUrl: './site-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SiteDialog {
  protected readonly site = inject<SiteView | null>(MAT_DIALOG_DATA);
  private readonly api = inject(SitesApi);
  private readonly dialogRef = inject(MatDialogRef<SiteDialog, boolean>);
  private readonly host = inject<ElementRef<HTMLElement>>(ElementRef);
  protected readonly unit = inject(AuthStore).displayUnit();
  protected readonly message = fieldMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);

  protected readonly heatRange = { min: inUnit(heatLimitF.min, this.unit), max: inUnit(heatLimitF.max, this.unit) };
  protected readonly range = (setting: NumericSetting) => rangeText(settingLimits[setting], settingLimits[setting].unit);
  protected readonly heatRangeText = rangeText(this.heatRange, `°${this.unit}`);

  private readonly settings = this.site?.settings ?? settingDefaults;
  private readonly savedHeat = this.settings.sprayHeatLimitF;
  private readonly fb = inject(NonNullableFormBuilder);
  protected readonly form = this.fb.group({
    code: [this.site?.code ?? '', [siteCodeValidator]],
    name: [this.site?.name ?? '', [siteNameValidator]],
    timeZone: [this.site?.timeZone ?? '', [timeZoneValidator]],
    storeWithinMinutes: [this.settings.storeWithinMinutes as number | null, settingValidator(settingLimits.storeWithinMinutes)],
    staleDataHours: [this.settings.staleDataHours as number | null, settingValidator(settingLimits.staleDataHours)],
    projectionHorizonDays: [this.settings.projectionHorizonDays as number | null, settingValidator(settingLimits.projectionHorizonDays)],
    overagePercent: [this.settings.overagePercent as number | null, settingValidator(settingLimits.overagePercent)],
    expiryAlertDays: [this.settings.expiryAlertDays.join(', '), dayListValidator],
    reorderMarginDays: [this.settings.reorderMarginDays as number | null, settingValidator(settingLimits.reorderMarginDays)],
    heatLimit: [
      this.savedHeat === null ? null : (inUnit(this.savedHeat, this.unit) as number | null),
      settingValidator({ ...this.heatRange, integer: false, unit: `°${this.unit}` }, true),
    ],
  });

  /** The zones matching what is typed (spaces match underscores), at most 40 so the list stays short. */
  private readonly zoneTyped = toSignal(this.form.controls.timeZone.valueChanges, { initialValue: this.form.controls.timeZone.value });
  protected readonly zoneOptions = computed(() => {
    const typed = this.zoneTyped().trim().toLowerCase().replace(/ /g, '_');
    return allZones.filter((zone) => zone.toLowerCase().includes(typed)).slice(0, 40);
  });

  protected async save(): Promise<void> {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      this.focusFirstInvalid();
      return;
    }
    this.saving.set(true);
    this.formError.set(null);
    try {
      await firstValueFrom(this.api.save(this.site?.id ?? null, this.input()));
      this.dialogRef.close(true);
    } catch (error) {
      this.formError.set(applyServerErrors(this.form, onThisForm(error)));
      this.focusFirstInvalid();
    } finally {
      this.saving.set(false);
    }
  }

  /** The dialog is long: take the user (and the screen reader) to the first field to correct. */
  private focusFirstInvalid(): void {
    const name = Object.entries(this.form.controls).find(([, control]) => control.invalid)?.[0];
    if (name) this.host.nativeElement.querySelector<HTMLInputElement>(`[formcontrolname="${name}"]`)?.focus();
  }

  private input(): SiteInput {
    const value = this.form.getRawValue();
    const entered = value.heatLimit;
    // Stored in °F; a value shown unchanged is kept as saved so a round trip through °C does not drift it.
    const sprayHeatLimitF =
      entered === null ? null : this.savedHeat !== null && entered === inUnit(this.savedHeat, this.unit) ? this.savedHeat : Math.round(fromCelsius(toCelsius(entered, this.unit), 'F') * 10) / 10;
    return {
      code: value.code.trim().toUpperCase(),
      name: value.name.trim(),
      timeZone: value.timeZone.trim(),
      settings: {
        storeWithinMinutes: value.storeWithinMinutes!,
        staleDataHours: value.staleDataHours!,
        projectionHorizonDays: value.projectionHorizonDays!,
        overagePercent: value.overagePercent!,
        expiryAlertDays: parseDayList(value.expiryAlertDays) as number[],
        reorderMarginDays: value.reorderMarginDays!,
        sprayHeatLimitF,
      },
    };
  }
}

/** The server names settings by their path ("settings.staleDataHours", "settings.expiryAlertDays.1"): map them to this form's controls. */
function onThisForm(error: unknown): ApiError {
  const problem = ApiError.from(error);
  const fields = problem.fields.map(({ field, message }) => {
    const [head, setting] = field.split('.');
    if (head !== 'settings' || !setting) return { field, message };
    return { field: setting === 'sprayHeatLimitF' ? 'heatLimit' : setting, message };
  });
  return new ApiError(problem.status, problem.message, fields);
}
