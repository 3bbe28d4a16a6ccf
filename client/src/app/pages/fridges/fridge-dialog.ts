// Add or change a fridge: site, code, name, place, alarm range as entered, and whether it shows min/max since reset.
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { firstValueFrom } from 'rxjs';
import type { FridgeView } from '@shared/fridges/fridge-schemas.js';
import type { SiteView } from '@shared/sites/site-schemas.js';
import { DEFAULT_STORAGE_RANGE } from '@shared/temperature/index.js';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { FridgesApi } from './fridges-api';

export interface FridgeDialogData {
  fridge: FridgeView | null;
  sites: SiteView[];
}

@Component({
  selector: 'vy-fridge-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatSelectModule, MatButtonModule, MatButtonToggleModule, MatCheckboxModule],
  templateUrl: './fridge-dialog.html',
  styleUrl: './fridge-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FridgeDialog {
  protected readonly data = inject<FridgeDialogData>(MAT_DIALOG_DATA);
  private readonly api = inject(FridgesApi);
  private readonly dialogRef = inject(MatDialogRef<FridgeDialog, boolean>);
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  protected readonly editing = this.data.fridge !== null;

  private readonly f = this.data.fridge;
  protected readonly form = inject(NonNullableFormBuilder).group({
    siteId: [{ value: this.f?.siteId ?? this.data.sites[0]?.id ?? 0, disabled: this.editing }, Validators.required],
    code: [this.f?.code ?? '', [Validators.required, Validators.pattern(/^[A-Za-z0-9-]{2,20}$/)]],
    name: [this.f?.name ?? '', [Validators.required, Validators.maxLength(80)]],
    place: [this.f?.place ?? '', Validators.maxLength(120)],
    alarmLow: [this.f?.alarm.low ?? DEFAULT_STORAGE_RANGE.low, Validators.required],
    alarmHigh: [this.f?.alarm.high ?? DEFAULT_STORAGE_RANGE.high, Validators.required],
    alarmUnit: [(this.f?.alarm.unit ?? DEFAULT_STORAGE_RANGE.unit) as 'F' | 'C'],
    minMaxDisplay: [this.f?.minMaxDisplay ?? true],
  });

  protected async save(): Promise<void> {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const value = this.form.getRawValue();
    const input = { ...value, alarmLow: Number(value.alarmLow), alarmHigh: Number(value.alarmHigh) };
    this.saving.set(true);
    this.formError.set(null);
    try {
      await firstValueFrom(this.f ? this.api.update(this.f.id, input) : this.api.create(input));
      this.dialogRef.close(true);
    } catch (error) {
      this.formError.set(applyServerErrors(this.form, error));
    } finally {
      this.saving.set(false);
    }
  }
}
