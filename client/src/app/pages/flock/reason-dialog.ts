// Asks for the reason behind a decision (cancelling a vaccination, a veterinarian's withdrawal override) and sends it.
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { firstValueFrom, type Observable } from 'rxjs';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';

export interface ReasonDialogData {
  title: string;
  /** What the person is deciding, in a sentence or two. */
  intro: string;
  label: string;
  minLength: number;
  action: string;
  send: (reason: string) => Observable<unknown>;
}

@Component({
  selector: 'vy-reason-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatButtonModule],
  template: `
    <h2 mat-dialog-title>{{ data.title }}</h2>
    <form [formGroup]="form" (ngSubmit)="save()" novalidate>
      <mat-dialog-content class="content">
        @if (formError(); as error) {
          <p class="form-error" role="alert">{{ error }}</p>
        }
        <p class="notice">{{ data.intro }}</p>
        <mat-form-field>
          <mat-label>{{ data.label }}</mat-label>
          <textarea matInput formControlName="reason" rows="3" required></textarea>
          @if (form.controls.reason.invalid) {
            <mat-error>{{ message(form.controls.reason, { minlength: 'Say a little more (at least ' + data.minLength + ' characters).' }) }}</mat-error>
          }
        </mat-form-field>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>Back</button>
        <button mat-flat-button type="submit" [disabled]="saving()">{{ data.action }}</button>
      </mat-dialog-actions>
    </form>
  `,
  styleUrl: '../../shared/flocks/form-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReasonDialog {
  protected readonly data = inject<ReasonDialogData>(MAT_DIALOG_DATA);
  private readonly dialogRef = inject(MatDialogRef<ReasonDialog, boolean>);
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  protected readonly form = inject(NonNullableFormBuilder).group({
    reason: ['', [Validators.required, Validators.minLength(this.data.minLength), Validators.maxLength(2000)]],
  });

  protected async save(): Promise<void> {
    if (this.form.invalid) return this.form.markAllAsTouched();
    this.saving.set(true);
    this.formError.set(null);
    try {
      await firstValueFrom(this.data.send(this.form.getRawValue().reason.trim()));
      this.dialogRef.close(true);
    } catch (error) {
      this.formError.set(applyServerErrors(this.form, error));
    } finally {
      this.saving.set(false);
    }
  }
}
