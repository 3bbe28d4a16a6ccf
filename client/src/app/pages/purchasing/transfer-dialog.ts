// Plan to bring another site's spare vials of a lot to a short site; storage staff then move them.
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { firstValueFrom } from 'rxjs';
import type { TransferCandidate } from '@shared/demand/transfer-candidates.js';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { DemandApi } from '../../shared/flocks/demand-api';

export interface TransferDialogData {
  siteId: number;
  siteName: string;
  productName: string;
  today: string;
  candidate: TransferCandidate;
}

@Component({
  selector: 'vy-transfer-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatButtonModule],
  template: `
    <h2 mat-dialog-title>Plan a transfer to {{ data.siteName }}</h2>
    <form [formGroup]="form" (ngSubmit)="save()" novalidate>
      <mat-dialog-content class="content">
        @if (formError(); as error) {
          <p class="form-error" role="alert">{{ error }}</p>
        }
        <p class="hint">
          {{ data.productName }}, lot {{ data.candidate.lotNumber }} (expires {{ data.candidate.expiry }}) at {{ data.candidate.siteName }}:
          {{ data.candidate.spareVials }} vials left after its own planned vaccinations.
        </p>
        <div class="row">
          <mat-form-field>
            <mat-label>Vials</mat-label>
            <input matInput type="number" formControlName="vials" min="1" [max]="data.candidate.spareVials" required />
            @if (form.controls.vials.invalid) {
              <mat-error>{{ message(form.controls.vials, { max: 'At most ' + data.candidate.spareVials + ' vials.' }) }}</mat-error>
            }
          </mat-form-field>
          <mat-form-field>
            <mat-label>Planned for</mat-label>
            <input matInput type="date" formControlName="plannedOn" required />
            @if (form.controls.plannedOn.invalid) {
              <mat-error>{{ message(form.controls.plannedOn) }}</mat-error>
            }
          </mat-form-field>
        </div>
        <mat-form-field>
          <mat-label>Notes for storage staff</mat-label>
          <input matInput formControlName="notes" />
        </mat-form-field>
        <p class="notice">Vials travel cold, in a cool box with coolant, and go straight into a fridge on arrival.</p>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>Cancel</button>
        <button mat-flat-button type="submit" [disabled]="saving()">Plan transfer</button>
      </mat-dialog-actions>
    </form>
  `,
  styleUrl: '../../shared/flocks/form-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TransferDialog {
  protected readonly data = inject<TransferDialogData>(MAT_DIALOG_DATA);
  private readonly api = inject(DemandApi);
  private readonly dialogRef = inject(MatDialogRef<TransferDialog, boolean>);
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  private readonly fb = inject(NonNullableFormBuilder);
  protected readonly form = this.fb.group({
    vials: this.fb.control<number | null>(this.data.candidate.suggestedVials, [Validators.required, Validators.min(1), Validators.max(this.data.candidate.spareVials)]),
    plannedOn: [this.data.today, Validators.required],
    notes: [''],
  });

  protected async save(): Promise<void> {
    if (this.form.invalid) return this.form.markAllAsTouched();
    this.saving.set(true);
    this.formError.set(null);
    try {
      await firstValueFrom(this.api.planTransfer(this.data.siteId, { ...this.form.getRawValue(), lotId: this.data.candidate.lotId, fromSiteId: this.data.candidate.siteId }));
      this.dialogRef.close(true);
    } catch (error) {
      this.formError.set(applyServerErrors(this.form, error));
    } finally {
      this.saving.set(false);
    }
  }
}
