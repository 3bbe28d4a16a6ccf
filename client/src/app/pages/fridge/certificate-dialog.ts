// Upload a logger's calibration certificate (PDF or image) with its calibration and due dates.
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { firstValueFrom } from 'rxjs';
import type { LoggerView } from '@shared/fridges/logger-schemas.js';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { FridgesApi } from '../fridges/fridges-api';

const inYears = (years: number) => {
  const d = new Date();
  d.setFullYear(d.getFullYear() + years);
  return d.toISOString().slice(0, 10);
};

@Component({
  selector: 'vy-certificate-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatButtonModule],
  template: `
    <h2 mat-dialog-title>Calibration certificate for {{ data.logger.serial }}</h2>
    <form [formGroup]="form" (ngSubmit)="save()" novalidate>
      <mat-dialog-content class="content">
        @if (formError(); as error) {
          <p class="form-error" role="alert">{{ error }}</p>
        }
        <label class="file">
          <span>Certificate file (PDF, PNG or JPEG)</span>
          <input type="file" accept="application/pdf,image/png,image/jpeg" (change)="pick($event)" />
        </label>
        <mat-form-field>
          <mat-label>Calibrated on</mat-label>
          <input matInput type="date" formControlName="calibratedOn" required />
        </mat-form-field>
        <mat-form-field>
          <mat-label>Recalibration due</mat-label>
          <input matInput type="date" formControlName="dueOn" required />
          <mat-hint>Guidance: every 2–3 years, or as the maker says. Vialyard reminds you 60 days before.</mat-hint>
          @if (form.controls.dueOn.invalid) {
            <mat-error>{{ message(form.controls.dueOn) }}</mat-error>
          }
        </mat-form-field>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>Cancel</button>
        <button mat-flat-button type="submit" [disabled]="saving()">Upload</button>
      </mat-dialog-actions>
    </form>
  `,
  styles: `.content { display: flex; flex-direction: column; gap: 12px; } .file { display: flex; flex-direction: column; gap: 4px; font: var(--mat-sys-body-medium); } .form-error { margin: 0; padding: 12px; border-radius: 8px; background: var(--mat-sys-error-container); color: var(--mat-sys-on-error-container); }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CertificateDialog {
  protected readonly data = inject<{ logger: LoggerView }>(MAT_DIALOG_DATA);
  private readonly api = inject(FridgesApi);
  private readonly dialogRef = inject(MatDialogRef<CertificateDialog, boolean>);
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  private readonly file = signal<File | null>(null);
  protected readonly form = inject(NonNullableFormBuilder).group({
    calibratedOn: [new Date().toISOString().slice(0, 10), Validators.required],
    dueOn: [inYears(2), Validators.required],
  });

  protected pick(event: Event): void {
    this.file.set((event.target as HTMLInputElement).files?.[0] ?? null);
  }

  protected async save(): Promise<void> {
    const file = this.file();
    if (!file) {
      this.formError.set('Choose the certificate file.');
      return;
    }
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.saving.set(true);
    this.formError.set(null);
    try {
      const { calibratedOn, dueOn } = this.form.getRawValue();
      await firstValueFrom(this.api.addCertificate(this.data.logger.id, file, calibratedOn, dueOn));
      this.dialogRef.close(true);
    } catch (error) {
      this.formError.set(applyServerErrors(this.form, error));
    } finally {
      this.saving.set(false);
    }
  }
}
