// Enter or change a purchase order by hand: site, supplier, expected date, carrier and tracking, and lines of packs.
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { firstValueFrom } from 'rxjs';
import { presentationLabel } from '@shared/catalogue/presentation-label.js';
import type { ProductView } from '@shared/catalogue/product-schemas.js';
import type { SupplierView } from '@shared/catalogue/supplier-schemas.js';
import type { PurchaseOrderView } from '@shared/receiving/purchase-order-schemas.js';
import type { SiteView } from '@shared/sites/site-schemas.js';
import { ApiError } from '../../core/http/api-error';
import { controlMessage } from '../../core/forms/server-errors';
import { PurchaseOrdersApi } from './purchase-orders-api';

export interface PurchaseOrderDialogData {
  order: PurchaseOrderView | null;
  sites: SiteView[];
  suppliers: SupplierView[];
  products: ProductView[];
}

@Component({
  selector: 'vy-purchase-order-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatSelectModule, MatButtonModule, MatIconModule],
  templateUrl: './purchase-order-dialog.html',
  styleUrl: './purchase-order-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PurchaseOrderDialog {
  protected readonly data = inject<PurchaseOrderDialogData>(MAT_DIALOG_DATA);
  private readonly api = inject(PurchaseOrdersApi);
  private readonly dialogRef = inject(MatDialogRef<PurchaseOrderDialog, boolean>);
  private readonly fb = inject(NonNullableFormBuilder);
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  protected readonly packs = this.data.products.flatMap((product) => product.presentations.map((p) => ({ id: p.id, label: presentationLabel(product.name, p) })));
  private readonly order = this.data.order;

  protected readonly form = this.fb.group({
    siteId: [this.order?.siteId ?? this.data.sites[0]?.id ?? 0, Validators.required],
    supplierId: [this.order?.supplierId ?? (null as number | null), Validators.required],
    reference: [this.order?.reference ?? '', [Validators.required, Validators.maxLength(40)]],
    expectedDate: [this.order?.expectedDate ?? new Date().toISOString().slice(0, 10), Validators.required],
    carrier: [this.order?.carrier ?? ''],
    trackingNumber: [this.order?.trackingNumber ?? ''],
    notes: [this.order?.notes ?? ''],
    lines: this.fb.array((this.order?.lines ?? [{ presentationId: null, packs: 1 }]).map((line) => this.lineGroup(line.presentationId, line.packs))),
  });

  private lineGroup(presentationId: number | null = null, packs = 1) {
    return this.fb.group({ presentationId: [presentationId, Validators.required], packs: [packs, [Validators.required, Validators.min(1)]] });
  }

  protected addLine(): void {
    this.form.controls.lines.push(this.lineGroup());
  }

  protected removeLine(index: number): void {
    this.form.controls.lines.removeAt(index);
  }

  protected async save(): Promise<void> {
    if (this.form.invalid) return this.form.markAllAsTouched();
    const { siteId, ...body } = this.form.getRawValue();
    this.saving.set(true);
    this.formError.set(null);
    try {
      await firstValueFrom(this.api.save(siteId, this.order?.id ?? null, body));
      this.dialogRef.close(true);
    } catch (error) {
      const apiError = ApiError.from(error);
      for (const { field, message } of apiError.fields) this.form.get(field)?.setErrors({ server: message });
      this.formError.set(apiError.message);
    } finally {
      this.saving.set(false);
    }
  }
}
