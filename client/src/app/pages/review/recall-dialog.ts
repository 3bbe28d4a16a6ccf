// A veterinarian's recall: every lot with this number, on every site, is held "do not use" for a decision.
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { firstValueFrom } from 'rxjs';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { CatalogueApi } from '../../shared/catalogue/catalogue-api';
import { ReviewApi } from './review-api';

@Component({
  selector: 'vy-recall-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatSelectModule, MatButtonModule],
  template: `
    <h2 mat-dialog-title>Place a recall</h2>
    <form [formGroup]="form" (ngSubmit)="place()" novalidate>
      <mat-dialog-content class="content">
        <p>Every lot with this number (of the product you pick, or of any product), on every site and whatever its letter case, is held "do not use" until you decide it.</p>
        @if (formError(); as error) {
          <p class="vy-form-error" role="alert">{{ error }}</p>
        }
        <mat-form-field>
          <mat-label>Lot number</mat-label>
          <input matInput formControlName="lotNumber" maxlength="60" required />
          <mat-error>{{ message(form.controls.lotNumber) }}</mat-error>
        </mat-form-field>
        <mat-form-field>
          <mat-label>Product (optional)</mat-label>
          <mat-select formControlName="productId">
            <mat-option [value]="null">Any product with this lot number</mat-option>
            @for (product of products.value() ?? []; track product.id) {
              <mat-option [value]="product.id">{{ product.name }}</mat-option>
            }
          </mat-select>
          <mat-hint>Pick one when another product uses the same lot number.</mat-hint>
          <mat-error>{{ message(form.controls.productId) }}</mat-error>
        </mat-form-field>
        <mat-form-field>
          <mat-label>Reason</mat-label>
          <textarea matInput formControlName="reason" rows="3" maxlength="2000" required></textarea>
          <mat-error>{{ message(form.controls.reason) }}</mat-error>
        </mat-form-field>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>Cancel</button>
        <button mat-flat-button type="submit" [disabled]="saving()">Recall</button>
      </mat-dialog-actions>
    </form>
  `,
  styles: `.content { display: flex; flex-direction: column; gap: 8px; }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RecallDialog {
  private readonly api = inject(ReviewApi);
  private readonly dialogRef = inject(MatDialogRef<RecallDialog, boolean>);
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  private readonly catalogue = inject(CatalogueApi);
  protected readonly products = rxResource({ stream: () => this.catalogue.products() });
  protected readonly form = inject(NonNullableFormBuilder).group({
    lotNumber: ['', Validators.required],
    productId: [null as number | null],
    reason: ['', Validators.required],
  });

  protected async place(): Promise<void> {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.saving.set(true);
    this.formError.set(null);
    try {
      await firstValueFrom(this.api.recall(this.form.getRawValue()));
      this.dialogRef.close(true);
    } catch (error) {
      this.formError.set(applyServerErrors(this.form, error));
    } finally {
      this.saving.set(false);
    }
  }
}
