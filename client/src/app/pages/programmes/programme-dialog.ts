// Create or change a programme: its name and its steps (product, age in days or weeks, route, notes), in order.
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { firstValueFrom } from 'rxjs';
import { productRouteLabels, productRoutes, type ProductRoute } from '@shared/catalogue/product-kinds.js';
import { ageUnits, type AgeUnit } from '@shared/flocks/age-units.js';
import type { ProgrammeStepView, ProgrammeView } from '@shared/flocks/programme-schemas.js';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { ApiError } from '../../core/http/api-error';
import { CatalogueApi } from '../../shared/catalogue/catalogue-api';
import { FlocksApi } from '../../shared/flocks/flocks-api';
import { CountPipe } from '../../shared/text/count-pipe';

@Component({
  selector: 'vy-programme-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatSelectModule, MatSlideToggleModule, MatButtonModule, MatIconModule, CountPipe],
  templateUrl: './programme-dialog.html',
  styleUrls: ['../../shared/flocks/form-dialog.scss', './programme-dialog.scss'],
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ProgrammeDialog {
  protected readonly programme = inject<ProgrammeView | null>(MAT_DIALOG_DATA);
  private readonly api = inject(FlocksApi);
  private readonly dialogRef = inject(MatDialogRef<ProgrammeDialog, boolean>);
  protected readonly products = toSignal(inject(CatalogueApi).products());
  protected readonly routes = productRoutes;
  protected readonly routeLabels = productRouteLabels;
  protected readonly units = ageUnits;
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  private readonly fb = inject(NonNullableFormBuilder);

  protected readonly form = this.fb.group({
    name: [this.programme?.name ?? '', [Validators.required, Validators.maxLength(120)]],
    notes: [this.programme?.notes ?? ''],
    active: [this.programme?.active ?? true],
    steps: this.fb.array((this.programme?.steps ?? []).map((step) => this.stepGroup(step))),
  });

  constructor() {
    if (!this.programme) this.addStep();
  }

  private stepGroup(step: ProgrammeStepView | null) {
    return this.fb.group({
      id: this.fb.control<number | null>(step?.id ?? null),
      productId: this.fb.control<number | null>(step?.productId ?? null, Validators.required),
      ageValue: this.fb.control<number | null>(step?.ageValue ?? null, [Validators.required, Validators.min(0)]),
      ageUnit: [step?.ageUnit ?? ('days' as AgeUnit)],
      route: [step?.route ?? ('spray' as ProductRoute)],
      notes: [step?.notes ?? ''],
    });
  }

  protected addStep(): void {
    this.form.controls.steps.push(this.stepGroup(null));
  }

  protected removeStep(index: number): void {
    this.form.controls.steps.removeAt(index);
  }

  /** Server errors name steps as "steps.2.productId": put each on its control. */
  private placeStepErrors(error: unknown): void {
    for (const { field, message } of ApiError.from(error).fields) {
      const [root, index, name] = field.split('.');
      if (root !== 'steps' || name === undefined) continue;
      const control = this.form.controls.steps.at(Number(index))?.get(name);
      control?.setErrors({ server: message });
      control?.markAsTouched();
    }
  }

  protected async save(): Promise<void> {
    if (this.form.invalid) return this.form.markAllAsTouched();
    const value = this.form.getRawValue();
    const input = { ...value, steps: value.steps.map(({ id, ...step }) => (id === null ? step : { id, ...step })) };
    this.saving.set(true);
    this.formError.set(null);
    try {
      await firstValueFrom(this.api.saveProgramme(this.programme?.id ?? null, input));
      this.dialogRef.close(true);
    } catch (error) {
      this.placeStepErrors(error);
      this.formError.set(applyServerErrors(this.form, error));
    } finally {
      this.saving.set(false);
    }
  }
}
