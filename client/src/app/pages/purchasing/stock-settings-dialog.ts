// A product's stock settings at a site: safety stock in doses or days of cover (or proposed from past use), supplier, pack.
import { DecimalPipe, PercentPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { MatSelectModule } from '@angular/material/select';
import { firstValueFrom } from 'rxjs';
import type { SupplierView } from '@shared/catalogue/supplier-schemas.js';
import type { ProductStockSettingsView, SafetyStockKind } from '@shared/demand/demand-schemas.js';
import type { ProjectionPresentation } from '@shared/demand/projection-types.js';
import type { SafetyStockProposalView } from '@shared/demand/safety-stock-proposal.js';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { ApiError } from '../../core/http/api-error';
import { DemandApi } from '../../shared/flocks/demand-api';

export interface StockSettingsDialogData {
  settings: ProductStockSettingsView;
  suppliers: SupplierView[];
  presentations: ProjectionPresentation[];
}

@Component({
  selector: 'vy-stock-settings-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatSelectModule, MatRadioModule, MatButtonModule, DecimalPipe, PercentPipe],
  templateUrl: './stock-settings-dialog.html',
  styleUrl: '../../shared/flocks/form-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StockSettingsDialog {
  protected readonly data = inject<StockSettingsDialogData>(MAT_DIALOG_DATA);
  private readonly api = inject(DemandApi);
  private readonly dialogRef = inject(MatDialogRef<StockSettingsDialog, boolean>);
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  protected readonly proposal = signal<SafetyStockProposalView | null>(null);
  protected readonly proposalError = signal<string | null>(null);
  protected readonly serviceLevels = [0.9, 0.95, 0.97, 0.99];
  private readonly fb = inject(NonNullableFormBuilder);
  private readonly s = this.data.settings;

  protected readonly form = this.fb.group({
    safetyStockKind: [this.s.safetyStockKind as SafetyStockKind],
    safetyStockValue: this.fb.control<number | null>(this.s.safetyStockValue, [Validators.required, Validators.min(0)]),
    supplierId: this.fb.control<number | null>(this.s.supplierId),
    presentationId: this.fb.control<number | null>(this.s.presentationId),
    serviceLevel: this.fb.control<number | null>(this.s.serviceLevel),
  });
  protected readonly level = this.fb.control(this.s.serviceLevel ?? 0.95);

  protected async propose(): Promise<void> {
    this.proposalError.set(null);
    this.proposal.set(null);
    try {
      // The proposal uses the saved supplier's lead time: save a changed supplier first.
      const supplierId = this.form.controls.supplierId.value;
      if (supplierId !== this.s.supplierId) await firstValueFrom(this.api.saveSettings(this.s.siteId, this.s.productId, { ...this.form.getRawValue(), serviceLevel: null }));
      this.proposal.set(await firstValueFrom(this.api.proposeSafetyStock(this.s.siteId, this.s.productId, this.level.value)));
    } catch (error) {
      this.proposalError.set(ApiError.from(error).message);
    }
  }

  protected useProposal(proposal: SafetyStockProposalView): void {
    this.form.patchValue({ safetyStockKind: 'doses', safetyStockValue: proposal.safetyStockDoses, serviceLevel: proposal.serviceLevel });
  }

  protected async save(): Promise<void> {
    if (this.form.invalid) return this.form.markAllAsTouched();
    this.saving.set(true);
    this.formError.set(null);
    try {
      await firstValueFrom(this.api.saveSettings(this.s.siteId, this.s.productId, this.form.getRawValue()));
      this.dialogRef.close(true);
    } catch (error) {
      this.formError.set(applyServerErrors(this.form, error));
    } finally {
      this.saving.set(false);
    }
  }
}
