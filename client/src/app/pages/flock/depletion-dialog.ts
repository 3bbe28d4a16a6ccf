// Record the day a flock left its house; its open vaccinations from that day on are cancelled with it.
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { firstValueFrom } from 'rxjs';
import type { FlockView } from '@shared/flocks/flock-schemas.js';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { FlocksApi } from '../../shared/flocks/flocks-api';

@Component({
  selector: 'vy-depletion-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatButtonModule],
  template: `
    <h2 mat-dialog-title>Record depletion · {{ flock.name }}</h2>
    <form [formGroup]="form" (ngSubmit)="save()" novalidate>
      <mat-dialog-content class="content">
        @if (formError(); as error) {
          <p class="form-error" role="alert">{{ error }}</p>
        }
        <p class="notice">Open vaccinations from this day on are cancelled, and the flock’s record closes.</p>
        <mat-form-field>
          <mat-label>Depleted on</mat-label>
          <input matInput type="date" formControlName="depletedOn" required />
          @if (form.controls.depletedOn.invalid) {
            <mat-error>{{ message(form.controls.depletedOn) }}</mat-error>
          }
        </mat-form-field>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>Cancel</button>
        <button mat-flat-button type="submit" [disabled]="saving()">Record depletion</button>
      </mat-dialog-actions>
    </form>
  `,
  styleUrl: '../../shared/flocks/form-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DepletionDialog {
  protected readonly flock = inject<FlockView>(MAT_DIALOG_DATA);
  private readonly api = inject(FlocksApi);
  private readonly dialogRef = inject(MatDialogRef<DepletionDialog, FlockView | undefined>);
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  protected readonly form = inject(NonNullableFormBuilder).group({ depletedOn: [new Date().toLocaleDateString('en-CA'), Validators.required] });

  protected async save(): Promise<void> {
    if (this.form.invalid) return this.form.markAllAsTouched();
    this.saving.set(true);
    this.formError.set(null);
    try {
      this.dialogRef.close(await firstValueFrom(this.api.deplete(this.flock.id, this.form.getRawValue().depletedOn)));
    } catch (error) {
      this.formError.set(applyServerErrors(this.form, error));
    } finally {
      this.saving.set(false);
    }
  }
}
