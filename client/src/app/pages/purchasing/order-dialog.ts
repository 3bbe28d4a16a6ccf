// Turn reorder suggestions into a purchase order: edit supplier, number, date and lines, then send it (PDF by e-mail).
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { firstValueFrom, map } from 'rxjs';
import { presentationLabel } from '@shared/catalogue/presentation-label.js';
import type { SupplierView } from '@shared/catalogue/supplier-schemas.js';
import type { SentOrderView } from '@shared/demand/sent-order-view.js';
import { addDays } from '@shared/planning/iso-date.js';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { ApiError } from '../../core/http/api-error';
import { CatalogueApi } from '../../shared/catalogue/catalogue-api';
import { DemandApi } from '../../shared/flocks/demand-api';

export interface OrderDialogData {
  siteId: number;
  siteName: string;
  today: string;
  reference: string;
  supplierId: number | null;
  suppliers: SupplierView[];
  lines: { presentationId: number; packs: number }[];
}

@Component({
  selector: 'vy-order-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatSelectModule, MatButtonModule, MatIconModule],
  templateUrl: './order-dialog.html',
  styleUrls: ['../../shared/flocks/form-dialog.scss', './order-dialog.scss'],
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class OrderDialog {
  protected readonly data = inject<OrderDialogData>(MAT_DIALOG_DATA);
  private readonly api = inject(DemandApi);
  private readonly dialogRef = inject(MatDialogRef<OrderDialog, SentOrderView | undefined>);
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  /** Confirmed packs only: a proposed one is not yet checked against the label. */
  protected readonly packs = toSignal(
    inject(CatalogueApi)
      .products()
      .pipe(
        map((products) =>
          products.flatMap((product) =>
            product.presentations.filter((p) => p.status === 'confirmed').map((p) => ({ id: p.id, label: presentationLabel(product.name, p), vialsPerPack: p.vialsPerPack, dosesPerVial: p.dosesPerVial })),
          ),
        ),
      ),
    { initialValue: [] },
  );
  private readonly fb = inject(NonNullableFormBuilder);
  private readonly leadTime = (supplierId: number | null) => this.data.suppliers.find((s) => s.id === supplierId)?.leadTimeDays ?? 7;

  protected readonly form = this.fb.group({
    supplierId: this.fb.control<number | null>(this.data.supplierId, Validators.required),
    reference: [this.data.reference, [Validators.required, Validators.maxLength(40)]],
    expectedDate: [addDays(this.data.today, this.leadTime(this.data.supplierId)), Validators.required],
    carrier: [''],
    notes: [''],
    lines: this.fb.array(this.data.lines.map((line) => this.lineGroup(line.presentationId, line.packs))),
  });
  private readonly supplierId = toSignal(this.form.controls.supplierId.valueChanges, { initialValue: this.form.controls.supplierId.value });
  protected readonly supplierEmail = computed(() => this.data.suppliers.find((s) => s.id === this.supplierId())?.orderEmail ?? null);

  private lineGroup(presentationId: number | null, packs: number | null) {
    return this.fb.group({
      presentationId: this.fb.control<number | null>(presentationId, Validators.required),
      packs: this.fb.control<number | null>(packs, [Validators.required, Validators.min(1)]),
    });
  }

  protected addLine(): void {
    this.form.controls.lines.push(this.lineGroup(null, 1));
  }

  protected removeLine(index: number): void {
    this.form.controls.lines.removeAt(index);
  }

  protected lineSummary(index: number): string {
    const line = this.form.controls.lines.at(index).getRawValue();
    const pack = this.packs().find((p) => p.id === line.presentationId);
    if (!pack || !line.packs) return '';
    const vials = line.packs * pack.vialsPerPack;
    return `${vials.toLocaleString()} vials · ${(vials * pack.dosesPerVial).toLocaleString()} doses`;
  }

  protected async send(): Promise<void> {
    if (this.form.invalid) return this.form.markAllAsTouched();
    this.saving.set(true);
    this.formError.set(null);
    try {
      this.dialogRef.close(await firstValueFrom(this.api.createAndSend(this.data.siteId, this.form.getRawValue())));
    } catch (error) {
      for (const { field, message } of ApiError.from(error).fields) {
        const [root, index, name] = field.split('.');
        const control = root === 'lines' && name ? this.form.controls.lines.at(Number(index))?.get(name) : null;
        control?.setErrors({ server: message });
        control?.markAsTouched();
      }
      this.formError.set(applyServerErrors(this.form, error));
    } finally {
      this.saving.set(false);
    }
  }
}
