// An unknown GTIN at the door: the clerk says what the label shows, and the line can use it at once; purchasing confirms later.
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { firstValueFrom } from 'rxjs';
import type { ProductView } from '@shared/catalogue/product-schemas.js';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { CatalogueApi } from '../../shared/catalogue/catalogue-api';

export interface ProposeData {
  gtin: string;
  products: ProductView[];
}

export interface ProposeResult {
  product: ProductView;
  presentationId: number;
}

@Component({
  selector: 'vy-propose-presentation-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatSelectModule, MatButtonModule, MatButtonToggleModule],
  template: `
    <h2 mat-dialog-title>New barcode</h2>
    <form [formGroup]="form" (ngSubmit)="propose()" novalidate>
      <mat-dialog-content class="content">
        <p>GTIN <strong>{{ data.gtin }}</strong> is not in the catalogue yet. Say what the label shows; you can use it on this shipment now, and purchasing confirms it later.</p>
        @if (formError(); as error) {
          <p class="form-error" role="alert">{{ error }}</p>
        }
        <mat-form-field>
          <mat-label>Product</mat-label>
          <mat-select formControlName="productId">
            <mat-option [value]="0">Not in this list</mat-option>
            @for (product of data.products; track product.id) {
              <mat-option [value]="product.id">{{ product.name }}{{ product.maker ? ' (' + product.maker + ')' : '' }}</mat-option>
            }
          </mat-select>
        </mat-form-field>
        @if (form.controls.productId.value === 0) {
          <mat-form-field>
            <mat-label>Product name on the label</mat-label>
            <input matInput formControlName="productName" required />
            @if (form.controls.productName.invalid) {
              <mat-error>{{ message(form.controls.productName) }}</mat-error>
            }
          </mat-form-field>
        }
        <div class="row">
          <mat-form-field>
            <mat-label>Doses per vial</mat-label>
            <input matInput type="number" inputmode="numeric" formControlName="dosesPerVial" required min="1" />
            @if (form.controls.dosesPerVial.invalid) {
              <mat-error>{{ message(form.controls.dosesPerVial) }}</mat-error>
            }
          </mat-form-field>
          <mat-form-field>
            <mat-label>Vials per pack</mat-label>
            <input matInput type="number" inputmode="numeric" formControlName="vialsPerPack" required min="1" />
          </mat-form-field>
        </div>
        <p id="level-label" class="label">The barcode is on</p>
        <mat-button-toggle-group formControlName="gtinLevel" aria-labelledby="level-label">
          <mat-button-toggle value="pack">the pack</mat-button-toggle>
          <mat-button-toggle value="vial">a single vial</mat-button-toggle>
        </mat-button-toggle-group>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>Cancel</button>
        <button mat-flat-button type="submit" [disabled]="saving()">Use it on this shipment</button>
      </mat-dialog-actions>
    </form>
  `,
  styles: `
    .content { display: flex; flex-direction: column; gap: 8px; }
    .row { display: flex; gap: 8px; flex-wrap: wrap; }
    .row mat-form-field { flex: 1 1 140px; }
    .label { margin: 0; font: var(--mat-sys-label-large); }
    .form-error { padding: 12px; border-radius: 8px; background: var(--mat-sys-error-container); color: var(--mat-sys-on-error-container); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProposePresentationDialog {
  protected readonly data = inject<ProposeData>(MAT_DIALOG_DATA);
  private readonly api = inject(CatalogueApi);
  private readonly dialogRef = inject(MatDialogRef<ProposePresentationDialog, ProposeResult>);
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  protected readonly form = inject(NonNullableFormBuilder).group({
    productId: [this.data.products[0]?.id ?? 0],
    productName: [''],
    dosesPerVial: [1000, [Validators.required, Validators.min(1)]],
    vialsPerPack: [10, [Validators.required, Validators.min(1)]],
    gtinLevel: ['pack' as 'pack' | 'vial'],
  });

  protected async propose(): Promise<void> {
    if (this.form.invalid) return this.form.markAllAsTouched();
    const value = this.form.getRawValue();
    this.saving.set(true);
    this.formError.set(null);
    try {
      const result = await firstValueFrom(
        this.api.propose({
          gtin: this.data.gtin,
          gtinLevel: value.gtinLevel,
          productId: value.productId || null,
          productName: value.productId ? '' : value.productName,
          dosesPerVial: value.dosesPerVial,
          vialsPerPack: value.vialsPerPack,
        }),
      );
      this.dialogRef.close(result);
    } catch (error) {
      this.formError.set(applyServerErrors(this.form, error));
    } finally {
      this.saving.set(false);
    }
  }
}
