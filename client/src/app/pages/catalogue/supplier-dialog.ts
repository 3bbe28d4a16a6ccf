// Create or change a supplier: its name, where order mail goes, and its usual lead time.
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { firstValueFrom } from 'rxjs';
import type { SupplierView } from '@shared/catalogue/supplier-schemas.js';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { CatalogueApi } from '../../shared/catalogue/catalogue-api';

@Component({
  selector: 'vy-supplier-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatButtonModule],
  template: `
    <h2 mat-dialog-title>{{ supplier ? 'Edit ' + supplier.name : 'New supplier' }}</h2>
    <form [formGroup]="form" (ngSubmit)="save()" novalidate>
      <mat-dialog-content class="content">
        @if (formError(); as error) {
          <p class="form-error" role="alert">{{ error }}</p>
        }
        <mat-form-field>
          <mat-label>Name</mat-label>
          <input matInput formControlName="name" required />
          @if (form.controls.name.invalid) {
            <mat-error>{{ message(form.controls.name) }}</mat-error>
          }
        </mat-form-field>
        <mat-form-field>
          <mat-label>Order e-mail</mat-label>
          <input matInput type="email" formControlName="orderEmail" required />
          <mat-hint>Discrepancy reports go here too.</mat-hint>
          @if (form.controls.orderEmail.invalid) {
            <mat-error>{{ message(form.controls.orderEmail) }}</mat-error>
          }
        </mat-form-field>
        <mat-form-field>
          <mat-label>Lead time (days)</mat-label>
          <input matInput type="number" formControlName="leadTimeDays" min="0" required />
          @if (form.controls.leadTimeDays.invalid) {
            <mat-error>{{ message(form.controls.leadTimeDays) }}</mat-error>
          }
        </mat-form-field>
        <mat-form-field>
          <mat-label>Notes</mat-label>
          <textarea matInput formControlName="notes" rows="2"></textarea>
        </mat-form-field>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>Cancel</button>
        <button mat-flat-button type="submit" [disabled]="saving()">Save</button>
      </mat-dialog-actions>
    </form>
  `,
  styleUrl: './catalogue-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SupplierDialog {
  protected readonly supplier = inject<SupplierView | null>(MAT_DIALOG_DATA);
  private readonly api = inject(CatalogueApi);
  private readonly dialogRef = inject(MatDialogRef<SupplierDialog, boolean>);
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  protected readonly form = inject(NonNullableFormBuilder).group({
    name: [this.supplier?.name ?? '', [Validators.required, Validators.maxLength(120)]],
    orderEmail: [this.supplier?.orderEmail ?? '', [Validators.required, Validators.email]],
    leadTimeDays: [this.supplier?.leadTimeDays ?? 7, [Validators.required, Validators.min(0)]],
    notes: [this.supplier?.notes ?? ''],
  });

  protected async save(): Promise<void> {
    if (this.form.invalid) return this.form.markAllAsTouched();
    this.saving.set(true);
    this.formError.set(null);
    try {
      await firstValueFrom(this.api.saveSupplier(this.supplier?.id ?? null, this.form.getRawValue()));
      this.dialogRef.close(true);
    } catch (error) {
      this.formError.set(applyServerErrors(this.form, error));
    } finally {
      this.saving.set(false);
    }
  }
}
