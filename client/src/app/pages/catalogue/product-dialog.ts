// Create or correct a product from its label: kind, route, storage range as printed, freeze sensitivity, withdrawal.
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { firstValueFrom } from 'rxjs';
import { productKindLabels, productKinds, productRouteLabels, productRoutes, type ProductKind, type ProductRoute } from '@shared/catalogue/product-kinds.js';
import type { ProductView } from '@shared/catalogue/product-schemas.js';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { CatalogueApi } from '../../shared/catalogue/catalogue-api';

@Component({
  selector: 'vy-product-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatSelectModule, MatButtonModule, MatButtonToggleModule, MatSlideToggleModule],
  templateUrl: './product-dialog.html',
  styleUrl: './catalogue-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProductDialog {
  protected readonly product = inject<ProductView | null>(MAT_DIALOG_DATA);
  private readonly api = inject(CatalogueApi);
  private readonly dialogRef = inject(MatDialogRef<ProductDialog, boolean>);
  protected readonly message = controlMessage;
  protected readonly kinds = productKinds;
  protected readonly kindLabels = productKindLabels;
  protected readonly routes = productRoutes;
  protected readonly routeLabels = productRouteLabels;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  protected readonly form = inject(NonNullableFormBuilder).group({
    name: [this.product?.name ?? '', [Validators.required, Validators.maxLength(120)]],
    maker: [this.product?.maker ?? ''],
    kind: [(this.product?.kind ?? null) as ProductKind | null, Validators.required],
    route: [(this.product?.route ?? null) as ProductRoute | null, Validators.required],
    storageLow: [this.product?.storageLow ?? 35, Validators.required],
    storageHigh: [this.product?.storageHigh ?? 45, Validators.required],
    storageUnit: [this.product?.storageUnit ?? ('F' as 'F' | 'C')],
    freezeSensitive: [this.product?.freezeSensitive ?? true],
    useWithinMinutes: [this.product?.useWithinMinutes ?? (null as number | null)],
    timeOutLimitMinutes: [this.product?.timeOutLimitMinutes ?? (null as number | null), [Validators.min(0)]],
    withdrawalDays: [this.product?.withdrawalDays ?? 21, [Validators.required, Validators.min(0)]],
    notes: [this.product?.notes ?? ''],
  });

  protected async save(): Promise<void> {
    if (this.form.invalid) return this.form.markAllAsTouched();
    this.saving.set(true);
    this.formError.set(null);
    try {
      await firstValueFrom(this.api.saveProduct(this.product?.id ?? null, this.form.getRawValue()));
      this.dialogRef.close(true);
    } catch (error) {
      this.formError.set(applyServerErrors(this.form, error));
    } finally {
      this.saving.set(false);
    }
  }
}
