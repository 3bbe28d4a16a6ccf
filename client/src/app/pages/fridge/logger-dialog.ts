// Add a logger to a fridge: serial, model, primary or backup, installation date.
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { firstValueFrom } from 'rxjs';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { FridgesApi } from '../fridges/fridges-api';

@Component({
  selector: 'vy-logger-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatButtonModule, MatButtonToggleModule],
  template: `
    <h2 mat-dialog-title>Add a logger</h2>
    <form [formGroup]="form" (ngSubmit)="save()" novalidate>
      <mat-dialog-content class="content">
        @if (formError(); as error) {
          <p class="form-error" role="alert">{{ error }}</p>
        }
        <mat-form-field>
          <mat-label>Serial number</mat-label>
          <input matInput formControlName="serial" autocomplete="off" required />
          @if (form.controls.serial.invalid) {
            <mat-error>{{ message(form.controls.serial) }}</mat-error>
          }
        </mat-form-field>
        <mat-form-field>
          <mat-label>Model</mat-label>
          <input matInput formControlName="model" autocomplete="off" />
        </mat-form-field>
        <mat-button-toggle-group formControlName="role" aria-label="Role of the logger">
          <mat-button-toggle value="primary">Primary</mat-button-toggle>
          <mat-button-toggle value="backup">Backup</mat-button-toggle>
        </mat-button-toggle-group>
        @if (form.controls.role.invalid) {
          <p class="form-error" role="alert">{{ message(form.controls.role) }}</p>
        }
        <mat-form-field>
          <mat-label>Installed on</mat-label>
          <input matInput type="date" formControlName="installedOn" required />
        </mat-form-field>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>Cancel</button>
        <button mat-flat-button type="submit" [disabled]="saving()">Add logger</button>
      </mat-dialog-actions>
    </form>
  `,
  styles: `.content { display: flex; flex-direction: column; gap: 12px; } .form-error { margin: 0; padding: 12px; border-radius: 8px; background: var(--mat-sys-error-container); color: var(--mat-sys-on-error-container); }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LoggerDialog {
  private readonly data = inject<{ fridgeId: number }>(MAT_DIALOG_DATA);
  private readonly api = inject(FridgesApi);
  private readonly dialogRef = inject(MatDialogRef<LoggerDialog, boolean>);
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  protected readonly form = inject(NonNullableFormBuilder).group({
    serial: ['', [Validators.required, Validators.maxLength(60)]],
    model: ['', Validators.maxLength(120)],
    role: ['primary' as 'primary' | 'backup'],
    installedOn: [new Date().toISOString().slice(0, 10), Validators.required],
  });

  protected async save(): Promise<void> {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.saving.set(true);
    this.formError.set(null);
    try {
      await firstValueFrom(this.api.addLogger({ fridgeId: this.data.fridgeId, ...this.form.getRawValue() }));
      this.dialogRef.close(true);
    } catch (error) {
      this.formError.set(applyServerErrors(this.form, error));
    } finally {
      this.saving.set(false);
    }
  }
}
