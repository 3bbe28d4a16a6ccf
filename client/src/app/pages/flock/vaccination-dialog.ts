// Add a vaccination to a flock by hand, move a planned one to another day (a confirmed one then needs confirming again),
// or plan an overdue one again.
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { firstValueFrom } from 'rxjs';
import { productRouteLabels, productRoutes, type ProductRoute } from '@shared/catalogue/product-kinds.js';
import type { VaccinationView } from '@shared/flocks/vaccination-schemas.js';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { CatalogueApi } from '../../shared/catalogue/catalogue-api';
import { FlocksApi } from '../../shared/flocks/flocks-api';

export interface VaccinationDialogData {
  flockId: number;
  /** Null to add one; a vaccination to move it. */
  vaccination: VaccinationView | null;
  /** Set when the vaccination's day passed with nothing recorded: it is planned again, from the site's today on. */
  overdue: { stepLabel: string | null; daysLate: number; today: string } | null;
}

@Component({
  selector: 'vy-vaccination-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatSelectModule, MatButtonModule],
  template: `
    <h2 mat-dialog-title>{{ title }}</h2>
    <form [formGroup]="form" (ngSubmit)="save()" novalidate>
      <mat-dialog-content class="content">
        @if (formError(); as error) {
          <p class="form-error" role="alert">{{ error }}</p>
        }
        @if (data.overdue; as overdue) {
          <p class="notice">
            {{ overdue.stepLabel ? 'The programme’s ' + overdue.stepLabel + ' step' : 'It' }} was due on {{ data.vaccination?.plannedDate }},
            {{ overdue.daysLate }} {{ overdue.daysLate === 1 ? 'day' : 'days' }} ago, and nothing is recorded. Ask the flock veterinarian whether a
            late dose still fits the flock’s age and the interval to the next step; the product label decides.
          </p>
        } @else if (data.vaccination?.status === 'confirmed') {
          <p class="notice">Moving it returns it to planned: it must be confirmed again for the new day.</p>
        }
        @if (!data.vaccination) {
          <div class="row">
            <mat-form-field>
              <mat-label>Product</mat-label>
              <mat-select formControlName="productId" required>
                @for (product of products() ?? []; track product.id) {
                  <mat-option [value]="product.id">{{ product.name }}</mat-option>
                }
              </mat-select>
              @if (form.controls.productId.invalid) {
                <mat-error>{{ message(form.controls.productId) }}</mat-error>
              }
            </mat-form-field>
            <mat-form-field>
              <mat-label>Route</mat-label>
              <mat-select formControlName="route" required>
                @for (route of routes; track route) {
                  <mat-option [value]="route">{{ routeLabels[route] }}</mat-option>
                }
              </mat-select>
            </mat-form-field>
          </div>
        }
        <mat-form-field>
          <mat-label>Planned date</mat-label>
          <input matInput type="date" formControlName="plannedDate" [attr.min]="data.overdue?.today ?? null" required />
          @if (form.controls.plannedDate.invalid) {
            <mat-error>{{ message(form.controls.plannedDate) }}</mat-error>
          }
        </mat-form-field>
        <mat-form-field>
          <mat-label>Notes</mat-label>
          <input matInput formControlName="notes" />
        </mat-form-field>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>Cancel</button>
        <button mat-flat-button type="submit" [disabled]="saving()">{{ data.overdue ? 'Plan' : data.vaccination ? 'Move' : 'Add vaccination' }}</button>
      </mat-dialog-actions>
    </form>
  `,
  styleUrl: '../../shared/flocks/form-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class VaccinationDialog {
  protected readonly data = inject<VaccinationDialogData>(MAT_DIALOG_DATA);
  private readonly api = inject(FlocksApi);
  private readonly dialogRef = inject(MatDialogRef<VaccinationDialog, boolean>);
  protected readonly products = toSignal(inject(CatalogueApi).products());
  protected readonly routes = productRoutes;
  protected readonly routeLabels = productRouteLabels;
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  protected readonly title = this.data.overdue
    ? `Plan ${this.data.vaccination!.productName} again`
    : this.data.vaccination
      ? `Move ${this.data.vaccination.productName}`
      : 'Add a vaccination';
  private readonly fb = inject(NonNullableFormBuilder);
  protected readonly form = this.fb.group({
    productId: this.fb.control<number | null>(null, this.data.vaccination ? [] : [Validators.required]),
    route: ['spray' as ProductRoute],
    // An overdue one starts on today: its own date is past, and the API plans nothing before today.
    plannedDate: [this.data.overdue?.today ?? this.data.vaccination?.plannedDate ?? '', Validators.required],
    notes: [this.data.vaccination?.notes ?? ''],
  });

  protected async save(): Promise<void> {
    if (this.form.invalid) return this.form.markAllAsTouched();
    const value = this.form.getRawValue();
    this.saving.set(true);
    this.formError.set(null);
    try {
      if (this.data.vaccination) await firstValueFrom(this.api.changeVaccination(this.data.vaccination.id, { plannedDate: value.plannedDate, notes: value.notes }));
      else await firstValueFrom(this.api.addVaccination(this.data.flockId, value));
      this.dialogRef.close(true);
    } catch (error) {
      this.formError.set(applyServerErrors(this.form, error));
    } finally {
      this.saving.set(false);
    }
  }
}
