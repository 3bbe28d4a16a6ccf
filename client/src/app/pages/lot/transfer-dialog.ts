// Moves vials of a lot to another fridge (on this or another site), with the times they left and arrived: the leaving
// time on the giving fridge's site's clock, the arrival on the receiving one's (two farms may be zones apart).
import { ChangeDetectionStrategy, Component, computed, effect, inject, signal, untracked } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { firstValueFrom } from 'rxjs';
import type { LotFilterOptions } from '@shared/lots/lot-list.js';
import type { LotPage, LotPagePlannedTransfer } from '@shared/lots/lot-page.js';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { LotsApi, type TransferResult } from '../../shared/lots/lots-api';
import { siteClockHint } from '../../shared/sites/site-clock-hint';
import { instantFromInput, localInputValue } from './local-time';

export interface TransferDialogData {
  lot: LotPage;
  fridges: LotFilterOptions['fridges'];
  /** A planned transfer this move carries out: its sites narrow the fridges, its vials fill the form. */
  planned?: LotPagePlannedTransfer;
}

@Component({
  selector: 'vy-transfer-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatSelectModule, MatButtonModule],
  template: `
    <h2 mat-dialog-title>Transfer vials of lot {{ data.lot.lotNumber }}</h2>
    @if (data.planned; as p) {
      <p class="planned">Carries out the transfer planned for {{ p.plannedOn }}: {{ p.vials }} vials from {{ p.fromSiteName }} to {{ p.toSiteName }}.</p>
    }
    <form [formGroup]="form" (ngSubmit)="save()" novalidate>
      <mat-dialog-content class="content">
        @if (formError(); as error) {
          <p class="vy-form-error" role="alert">{{ error }}</p>
        }
        <mat-form-field>
          <mat-label>From fridge</mat-label>
          <mat-select formControlName="fromFridgeId" required>
            @for (place of sources; track place.fridgeId) {
              <mat-option [value]="place.fridgeId">{{ place.fridgeCode }} · {{ place.siteName }} ({{ place.vials }} vials)</mat-option>
            }
          </mat-select>
          @if (form.controls.fromFridgeId.invalid) { <mat-error>{{ message(form.controls.fromFridgeId) }}</mat-error> }
        </mat-form-field>
        <mat-form-field>
          <mat-label>To fridge</mat-label>
          <mat-select formControlName="toFridgeId" required>
            @for (f of destinations(); track f.id) {
              <mat-option [value]="f.id">{{ f.code }} · {{ f.name }}</mat-option>
            }
          </mat-select>
          @if (form.controls.toFridgeId.invalid) { <mat-error>{{ message(form.controls.toFridgeId) }}</mat-error> }
        </mat-form-field>
        <mat-form-field>
          <mat-label>Vials</mat-label>
          <input matInput type="number" inputmode="numeric" min="1" step="1" formControlName="vials" required />
          @if (form.controls.vials.invalid) { <mat-error>{{ message(form.controls.vials, { min: 'At least 1 vial.' }) }}</mat-error> }
        </mat-form-field>
        <div class="times">
          <mat-form-field>
            <mat-label>Left the fridge at</mat-label>
            <input matInput type="datetime-local" formControlName="leftAt" required />
            <mat-hint>{{ leftHint() }}</mat-hint>
            @if (form.controls.leftAt.invalid) { <mat-error>{{ message(form.controls.leftAt) }}</mat-error> }
          </mat-form-field>
          <mat-form-field>
            <mat-label>Arrived at</mat-label>
            <input matInput type="datetime-local" formControlName="at" required />
            <mat-hint>{{ atHint() }}</mat-hint>
            @if (form.controls.at.invalid) { <mat-error>{{ message(form.controls.at) }}</mat-error> }
          </mat-form-field>
        </div>
        <p class="hint">{{ limitText }}</p>
        <mat-form-field>
          <mat-label>Note (optional)</mat-label>
          <input matInput formControlName="notes" maxlength="500" />
        </mat-form-field>
        <p class="advice">Carry vials in a cooler with conditioned cold packs, never loose; keep them out of a fridge as short a time as you can and follow the label.</p>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>Cancel</button>
        <button mat-flat-button type="submit" [disabled]="saving()">Record transfer</button>
      </mat-dialog-actions>
    </form>
  `,
  styles: `
    .content { display: flex; flex-direction: column; gap: 4px; }
    .times { display: flex; flex-wrap: wrap; gap: 0 12px; }
    .times mat-form-field { flex: 1 1 200px; }
    .planned { margin: 0 24px; font: var(--mat-sys-body-medium); }
    .hint { margin: 0 0 8px; color: var(--mat-sys-on-surface-variant); font: var(--mat-sys-body-small); }
    .advice { margin: 0; padding: 8px 12px; border-radius: 8px; background: var(--vy-warn-container); color: var(--vy-on-warn-container); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class TransferDialog {
  protected readonly data = inject<TransferDialogData>(MAT_DIALOG_DATA);
  private readonly api = inject(LotsApi);
  private readonly dialogRef = inject(MatDialogRef<TransferDialog, TransferResult>);
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  private readonly planned = this.data.planned ?? null;
  protected readonly sources = this.data.lot.locations.filter((l) => l.fridgeId !== null && (!this.planned || l.siteId === this.planned.fromSiteId));
  protected readonly limitText =
    this.data.lot.product.timeOutLimitMinutes === null
      ? 'This product has no recorded time-out limit: any time out of a fridge puts the lot on hold for the veterinarian.'
      : `Out of a fridge longer than ${this.data.lot.product.timeOutLimitMinutes} min puts the lot on hold for the veterinarian.`;

  /** When the dialog opened: the times' first value, on whichever clock the chosen fridges' sites keep. */
  private readonly openedAt = new Date();
  private readonly firstFrom = this.sources.length === 1 ? this.sources[0]! : null;
  protected readonly form = inject(NonNullableFormBuilder).group({
    fromFridgeId: [this.firstFrom?.fridgeId ?? (null as number | null), Validators.required],
    toFridgeId: [null as number | null, Validators.required],
    vials: [this.planned?.vials ?? 1, [Validators.required, Validators.min(1)]],
    leftAt: [localInputValue(this.openedAt, this.firstFrom?.timeZone ?? this.data.lot.timeZone), Validators.required],
    at: [localInputValue(this.openedAt, this.firstFrom?.timeZone ?? this.data.lot.timeZone), Validators.required],
    notes: [''],
  });
  private readonly from = toSignal(this.form.controls.fromFridgeId.valueChanges, { initialValue: this.form.controls.fromFridgeId.value });
  protected readonly destinations = computed(() => this.data.fridges.filter((f) => f.id !== this.from() && (!this.planned || f.siteId === this.planned.toSiteId)));
  private readonly to = toSignal(this.form.controls.toFridgeId.valueChanges, { initialValue: this.form.controls.toFridgeId.value });
  private readonly leftTyped = toSignal(this.form.controls.leftAt.valueChanges, { initialValue: this.form.controls.leftAt.value });
  private readonly atTyped = toSignal(this.form.controls.at.valueChanges, { initialValue: this.form.controls.at.value });
  /** The giving fridge's site's zone (the lot's own until one is chosen). */
  private readonly fromZone = computed(() => this.sources.find((s) => s.fridgeId === this.from())?.timeZone ?? this.data.lot.timeZone);
  /** The receiving fridge's site's zone (the giving one's until one is chosen). */
  private readonly toZone = computed(() => this.data.fridges.find((f) => f.id === this.to())?.timeZone ?? this.fromZone());
  protected readonly leftHint = computed(() => siteClockHint(this.leftTyped(), this.fromZone(), "the sending site's clock"));
  protected readonly atHint = computed(() => siteClockHint(this.atTyped(), this.toZone(), "the receiving site's clock"));

  constructor() {
    // A time nobody typed follows the clock of the fridge chosen: it stays the moment the dialog opened.
    effect(() => {
      const zone = this.fromZone();
      untracked(() => this.form.controls.leftAt.pristine && this.form.controls.leftAt.setValue(localInputValue(this.openedAt, zone)));
    });
    effect(() => {
      const zone = this.toZone();
      untracked(() => this.form.controls.at.pristine && this.form.controls.at.setValue(localInputValue(this.openedAt, zone)));
    });
  }

  protected async save(): Promise<void> {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const value = this.form.getRawValue();
    this.saving.set(true);
    this.formError.set(null);
    try {
      const result = await firstValueFrom(
        this.api.transfer(this.data.lot.id, { ...value, fromFridgeId: value.fromFridgeId!, toFridgeId: value.toFridgeId!, leftAt: instantFromInput(value.leftAt, this.fromZone()), at: instantFromInput(value.at, this.toZone()), plannedTransferId: this.planned?.id ?? null }),
      );
      this.dialogRef.close(result);
    } catch (error) {
      this.formError.set(applyServerErrors(this.form, error));
    } finally {
      this.saving.set(false);
    }
  }
}
