// Discards vials of a lot from one fridge: expired, damaged, or another reason said in words.
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { MatSelectModule } from '@angular/material/select';
import { firstValueFrom } from 'rxjs';
import { discardReasonLabels, discardReasons, type DiscardReason } from '@shared/lots/discard-reasons.js';
import type { LotPage } from '@shared/lots/lot-page.js';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { LotsApi } from '../../shared/lots/lots-api';

export interface DiscardDialogData {
  lot: LotPage;
}

@Component({
  selector: 'vy-discard-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatSelectModule, MatRadioModule, MatButtonModule],
  template: `
    <h2 mat-dialog-title>Discard vials of lot {{ data.lot.lotNumber }}</h2>
    <form [formGroup]="form" (ngSubmit)="save()" novalidate>
      <mat-dialog-content class="content">
        @if (formError(); as error) {
          <p class="vy-form-error" role="alert">{{ error }}</p>
        }
        @if (held) {
          <p class="advice">This lot is on hold: the veterinarian decides whether it is discarded. Only vials that are physically damaged may be discarded here.</p>
        }
        <mat-form-field>
          <mat-label>Fridge</mat-label>
          <mat-select formControlName="fridgeId" required>
            @for (place of sources; track place.fridgeId) {
              <mat-option [value]="place.fridgeId">{{ place.fridgeCode }} · {{ place.siteName }} ({{ place.vials }} vials)</mat-option>
            }
          </mat-select>
          @if (form.controls.fridgeId.invalid) { <mat-error>{{ message(form.controls.fridgeId) }}</mat-error> }
        </mat-form-field>
        <mat-form-field>
          <mat-label>Vials</mat-label>
          <input matInput type="number" inputmode="numeric" min="1" step="1" formControlName="vials" required />
          @if (form.controls.vials.invalid) { <mat-error>{{ message(form.controls.vials, { min: 'At least 1 vial.' }) }}</mat-error> }
        </mat-form-field>
        <mat-radio-group formControlName="reason" aria-label="Reason" class="reasons">
          @for (r of reasons; track r) {
            <mat-radio-button [value]="r">{{ labels[r] }}</mat-radio-button>
          }
        </mat-radio-group>
        @if (form.controls.reason.invalid && form.controls.reason.touched) {
          <p class="vy-form-error" role="alert">{{ message(form.controls.reason, { required: 'Choose a reason.' }) }}</p>
        }
        <mat-form-field>
          <mat-label>{{ form.controls.reason.value === 'other' ? 'Why' : 'Details (optional)' }}</mat-label>
          <input matInput formControlName="reasonText" maxlength="500" />
          @if (form.controls.reasonText.invalid) { <mat-error>{{ message(form.controls.reasonText) }}</mat-error> }
        </mat-form-field>
        <p class="hint">Discard live vaccine as the label and local rules say (many labels ask for it to be inactivated first); wear gloves and eye protection.</p>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>Cancel</button>
        <button mat-flat-button type="submit" [disabled]="saving()">Record discard</button>
      </mat-dialog-actions>
    </form>
  `,
  styles: `
    .content { display: flex; flex-direction: column; gap: 4px; }
    .reasons { display: flex; flex-direction: column; margin: 4px 0 12px; }
    .hint { margin: 0; color: var(--mat-sys-on-surface-variant); font: var(--mat-sys-body-small); }
    .advice { margin: 0 0 8px; padding: 8px 12px; border-radius: 8px; background: var(--vy-warn-container); color: var(--vy-on-warn-container); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DiscardDialog {
  protected readonly data = inject<DiscardDialogData>(MAT_DIALOG_DATA);
  private readonly api = inject(LotsApi);
  private readonly dialogRef = inject(MatDialogRef<DiscardDialog, boolean>);
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  protected readonly reasons = discardReasons;
  protected readonly labels = discardReasonLabels;
  protected readonly held = this.data.lot.status === 'on_hold';
  protected readonly sources = this.data.lot.locations.filter((l) => l.fridgeId !== null);
  protected readonly form = inject(NonNullableFormBuilder).group({
    fridgeId: [this.sources.length === 1 ? this.sources[0]!.fridgeId! : (null as number | null), Validators.required],
    vials: [1, [Validators.required, Validators.min(1)]],
    reason: ['' as DiscardReason | '', Validators.required],
    reasonText: [''],
  });

  protected async save(): Promise<void> {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const value = this.form.getRawValue();
    this.saving.set(true);
    this.formError.set(null);
    try {
      await firstValueFrom(this.api.discard(this.data.lot.id, { ...value, fridgeId: value.fridgeId!, reason: value.reason as DiscardReason }));
      this.dialogRef.close(true);
    } catch (error) {
      this.formError.set(applyServerErrors(this.form, error));
    } finally {
      this.saving.set(false);
    }
  }
}
