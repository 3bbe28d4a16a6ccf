// The signed decision on one held lot: release, release with a condition, or discard, signed by re-entering the password.
import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { firstValueFrom } from 'rxjs';
import { holdDecisionLabels, signatureMeaning, type HoldDecisionKind } from '@shared/lots/lot-status.js';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { ApiError } from '../../core/http/api-error';
import { ReviewApi, type QueueLot } from './review-api';

@Component({
  selector: 'vy-decision-dialog',
  imports: [DecimalPipe, ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatRadioModule, MatButtonModule],
  templateUrl: './decision-dialog.html',
  changeDetection: ChangeDetectionStrategy.OnPush,
  styles: `.content { display: flex; flex-direction: column; gap: 12px; } .meaning { font-style: italic; }`,
})
export class DecisionDialog {
  protected readonly lot = inject<QueueLot>(MAT_DIALOG_DATA);
  private readonly api = inject(ReviewApi);
  private readonly dialogRef = inject(MatDialogRef<DecisionDialog, boolean>);
  protected readonly kinds = Object.keys(holdDecisionLabels) as HoldDecisionKind[];
  protected readonly labels = holdDecisionLabels;
  protected readonly meaning = signatureMeaning;
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);

  protected readonly form = inject(NonNullableFormBuilder).group({
    decision: ['' as HoldDecisionKind | '', Validators.required],
    condition: [''],
    notes: [''],
    password: ['', Validators.required],
  });

  protected async sign(): Promise<void> {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const value = this.form.getRawValue();
    this.saving.set(true);
    this.formError.set(null);
    try {
      await firstValueFrom(this.api.decide(this.lot.holdId, { ...value, decision: value.decision as HoldDecisionKind }));
      this.dialogRef.close(true);
    } catch (error) {
      // The password is cleared after every failed signing, so the reason is said above the form, not under the field.
      this.formError.set(applyServerErrors(this.form, error) ?? ApiError.from(error).message);
      this.form.controls.password.reset();
    } finally {
      this.saving.set(false);
    }
  }
}
