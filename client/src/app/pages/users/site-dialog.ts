// An admin's settings of one site for the vaccination day: the heat limit above which spraying at night is advised, in the user's unit.
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { firstValueFrom } from 'rxjs';
import type { SiteView } from '@shared/sites/site-schemas.js';
import { fromCelsius, toCelsius } from '@shared/temperature/index.js';
import { AuthStore } from '../../core/auth/auth-store';
import { ApiError } from '../../core/http/api-error';
import { controlMessage } from '../../core/forms/server-errors';
import { SitesApi } from '../../core/sites/sites-api';

/** The setting's range (°F), as shared/sites/site-schemas.ts accepts it. */
const limitF = { min: 32, max: 130 };
const inUnit = (f: number, unit: 'F' | 'C') => Math.round(fromCelsius(toCelsius(f, 'F'), unit) * 10) / 10;

@Component({
  selector: 'vy-site-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatButtonModule],
  template: `
    <h2 mat-dialog-title>Site settings · {{ site.name }}</h2>
    <form [formGroup]="form" (ngSubmit)="save()" novalidate>
      <mat-dialog-content class="content">
        @if (formError(); as e) { <p class="form-error" role="alert">{{ e }}</p> }
        <mat-form-field>
          <mat-label>Spray heat limit (°{{ unit }})</mat-label>
          <input matInput type="number" inputmode="decimal" formControlName="heatLimit" />
          <mat-hint>Above this expected temperature the readiness check advises spraying at night. Leave empty for none; agree it with the flock veterinarian.</mat-hint>
          @if (form.controls.heatLimit.invalid) { <mat-error>{{ message(form.controls.heatLimit, { min: range, max: range }) }}</mat-error> }
        </mat-form-field>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>Cancel</button>
        <button mat-flat-button type="submit" [disabled]="saving()">Save settings</button>
      </mat-dialog-actions>
    </form>
  `,
  styleUrl: '../../shared/flocks/form-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SiteDialog {
  protected readonly site = inject<SiteView>(MAT_DIALOG_DATA);
  private readonly api = inject(SitesApi);
  private readonly dialogRef = inject(MatDialogRef<SiteDialog, boolean>);
  protected readonly unit = inject(AuthStore).displayUnit();
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  protected readonly range = `Between ${inUnit(limitF.min, this.unit)} and ${inUnit(limitF.max, this.unit)} °${this.unit}.`;
  private readonly saved = this.site.settings.sprayHeatLimitF;
  protected readonly form = inject(NonNullableFormBuilder).group({
    heatLimit: [
      this.saved === null ? null : inUnit(this.saved, this.unit) as number | null,
      [Validators.min(inUnit(limitF.min, this.unit)), Validators.max(inUnit(limitF.max, this.unit))],
    ],
  });

  protected async save(): Promise<void> {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const entered = this.form.controls.heatLimit.value;
    // Stored in °F; a value shown unchanged is kept as saved so a round trip through °C does not drift it.
    const sprayHeatLimitF = entered === null ? null : this.saved !== null && entered === inUnit(this.saved, this.unit) ? this.saved : Math.round(fromCelsius(toCelsius(entered, this.unit), 'F') * 10) / 10;
    this.saving.set(true);
    this.formError.set(null);
    try {
      await firstValueFrom(this.api.update(this.site, { sprayHeatLimitF }));
      this.dialogRef.close(true);
    } catch (error) {
      const problem = ApiError.from(error);
      this.formError.set([problem.message, ...problem.fields.map((f) => f.message)].join(' '));
    } finally {
      this.saving.set(false);
    }
  }
}
