// Records what storage staff did about an excursion, for the monthly record and the veterinarian.
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { firstValueFrom } from 'rxjs';
import type { ExcursionView } from '@shared/fridges/excursion-view.js';
import { FridgesApi } from '../fridges/fridges-api';

@Component({
  selector: 'vy-action-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatButtonModule],
  template: `
    <h2 mat-dialog-title>What was done about excursion #{{ data.excursion.id }}</h2>
    <form [formGroup]="form" (ngSubmit)="save()" novalidate>
      <mat-dialog-content class="content">
        <p class="advice">Keep the vaccine in the fridge at proper temperature, marked "do not use", and do not discard it unless directed: the veterinarian decides.</p>
        <mat-form-field>
          <mat-label>What was done</mat-label>
          <textarea matInput formControlName="actionTaken" rows="4" maxlength="2000"></textarea>
          <mat-hint>E.g. door closed, vaccine marked do not use, veterinarian called</mat-hint>
        </mat-form-field>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>Cancel</button>
        <button mat-flat-button type="submit" [disabled]="saving()">Save</button>
      </mat-dialog-actions>
    </form>
  `,
  styles: `.content { display: flex; flex-direction: column; gap: 12px; } .advice { margin: 0; padding: 12px; border-radius: 8px; background: var(--vy-warn-container); color: var(--vy-on-warn-container); }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ActionDialog {
  protected readonly data = inject<{ excursion: ExcursionView }>(MAT_DIALOG_DATA);
  private readonly api = inject(FridgesApi);
  private readonly dialogRef = inject(MatDialogRef<ActionDialog, boolean>);
  protected readonly saving = signal(false);
  protected readonly form = inject(NonNullableFormBuilder).group({ actionTaken: [this.data.excursion.actionTaken, Validators.maxLength(2000)] });

  protected async save(): Promise<void> {
    this.saving.set(true);
    try {
      await firstValueFrom(this.api.recordAction(this.data.excursion.id, this.form.getRawValue().actionTaken));
      this.dialogRef.close(true);
    } finally {
      this.saving.set(false);
    }
  }
}
