// Add or correct a presentation: doses per vial, vials per pack, the pack's and the single vial's GTIN, the price.
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators, type AbstractControl, type ValidationErrors } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { firstValueFrom } from 'rxjs';
import { isValidGtin } from '@shared/barcode/index.js';
import type { PresentationView } from '@shared/catalogue/presentation-schemas.js';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { CatalogueApi } from '../../shared/catalogue/catalogue-api';

export interface PresentationDialogData {
  productId: number;
  productName: string;
  presentation: PresentationView | null;
}

function gtinShape(control: AbstractControl<string>): ValidationErrors | null {
  const digits = control.value.replace(/[\s-]/g, '');
  return !digits || isValidGtin(digits) ? null : { server: 'Not a valid GTIN: 8, 12, 13 or 14 digits with the right check digit.' };
}

@Component({
  selector: 'vy-presentation-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatButtonModule],
  template: `
    <h2 mat-dialog-title>{{ data.presentation ? (data.presentation.status === 'proposed' ? 'Confirm pack' : 'Edit pack') : 'New pack' }} of {{ data.productName }}</h2>
    <form [formGroup]="form" (ngSubmit)="save()" novalidate>
      <mat-dialog-content class="content">
        @if (data.presentation?.status === 'proposed') {
          <p class="proposed">Proposed at receiving by {{ data.presentation?.proposedBy ?? 'a clerk' }}. Check it against the label; saving confirms it.</p>
        }
        @if (formError(); as error) {
          <p class="form-error" role="alert">{{ error }}</p>
        }
        <div class="row">
          <mat-form-field>
            <mat-label>Doses per vial</mat-label>
            <input matInput type="number" formControlName="dosesPerVial" min="1" required />
            @if (form.controls.dosesPerVial.invalid) {
              <mat-error>{{ message(form.controls.dosesPerVial) }}</mat-error>
            }
          </mat-form-field>
          <mat-form-field>
            <mat-label>Vials per pack</mat-label>
            <input matInput type="number" formControlName="vialsPerPack" min="1" required />
          </mat-form-field>
        </div>
        <mat-form-field>
          <mat-label>Pack GTIN</mat-label>
          <input matInput formControlName="packGtin" inputmode="numeric" autocomplete="off" />
          @if (form.controls.packGtin.invalid) {
            <mat-error>{{ message(form.controls.packGtin) }}</mat-error>
          }
        </mat-form-field>
        <mat-form-field>
          <mat-label>Single vial GTIN (when it differs)</mat-label>
          <input matInput formControlName="vialGtin" inputmode="numeric" autocomplete="off" />
          @if (form.controls.vialGtin.invalid) {
            <mat-error>{{ message(form.controls.vialGtin) }}</mat-error>
          }
        </mat-form-field>
        <mat-form-field>
          <mat-label>Price per vial</mat-label>
          <input matInput type="number" formControlName="unitPrice" min="0" step="0.01" />
          <!-- Per vial, as purchasing reads it: stock values, expiry losses and order amounts are vials × this price. -->
          <mat-hint>One vial's price; a pack costs this × the vials per pack.</mat-hint>
        </mat-form-field>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>Cancel</button>
        <button mat-flat-button type="submit" [disabled]="saving()">{{ data.presentation?.status === 'proposed' ? 'Confirm pack' : 'Save' }}</button>
      </mat-dialog-actions>
    </form>
  `,
  styleUrl: './catalogue-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PresentationDialog {
  protected readonly data = inject<PresentationDialogData>(MAT_DIALOG_DATA);
  private readonly api = inject(CatalogueApi);
  private readonly dialogRef = inject(MatDialogRef<PresentationDialog, boolean>);
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  protected readonly form = inject(NonNullableFormBuilder).group({
    dosesPerVial: [this.data.presentation?.dosesPerVial ?? 1000, [Validators.required, Validators.min(1)]],
    vialsPerPack: [this.data.presentation?.vialsPerPack ?? 10, [Validators.required, Validators.min(1)]],
    packGtin: [this.data.presentation?.packGtin ?? '', gtinShape],
    vialGtin: [this.data.presentation?.vialGtin ?? '', gtinShape],
    unitPrice: [this.data.presentation?.unitPrice ?? (null as number | null)],
  });

  protected async save(): Promise<void> {
    if (this.form.invalid) return this.form.markAllAsTouched();
    this.saving.set(true);
    this.formError.set(null);
    try {
      await firstValueFrom(this.api.savePresentation(this.data.productId, this.data.presentation?.id ?? null, this.form.getRawValue()));
      this.dialogRef.close(true);
    } catch (error) {
      this.formError.set(applyServerErrors(this.form, error));
    } finally {
      this.saving.set(false);
    }
  }
}
