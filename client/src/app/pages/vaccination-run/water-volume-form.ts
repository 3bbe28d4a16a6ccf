// For a veterinarian or admin: the water for this product and age, from the label or their own instruction (never a default).
import { ChangeDetectionStrategy, Component, inject, input, output, signal, type OnInit } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { firstValueFrom } from 'rxjs';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { DayApi, type RunView } from '../../shared/vaccination-day/day-api';

@Component({
  selector: 'vy-water-volume-form',
  imports: [ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatInputModule, MatSelectModule],
  template: `
    <form [formGroup]="form" (ngSubmit)="save()" novalidate class="fields">
      <p class="who">Enter the water volume as the label or the veterinarian gives it, for ages {{ form.controls.ageFromDays.value }}–{{ form.controls.ageToDays.value }} days.</p>
      @if (error(); as e) { <p class="form-error" role="alert">{{ e }}</p> }
      <mat-form-field><mat-label>mL of water per 1,000 birds</mat-label><input matInput type="number" inputmode="decimal" formControlName="mlPer1000Birds" required />
        @if (form.controls.mlPer1000Birds.invalid) { <mat-error>{{ message(form.controls.mlPer1000Birds) }}</mat-error> }</mat-form-field>
      <div class="row">
        <mat-form-field><mat-label>From age (days)</mat-label><input matInput type="number" formControlName="ageFromDays" /></mat-form-field>
        <mat-form-field><mat-label>To age (days)</mat-label><input matInput type="number" formControlName="ageToDays" />
          @if (form.controls.ageToDays.invalid) { <mat-error>{{ message(form.controls.ageToDays) }}</mat-error> }</mat-form-field>
      </div>
      <mat-form-field><mat-label>Source</mat-label>
        <mat-select formControlName="source"><mat-option value="label">The label</mat-option><mat-option value="veterinarian">The veterinarian</mat-option></mat-select></mat-form-field>
      <div><button mat-stroked-button type="submit" [disabled]="busy()">Save the water volume</button></div>
    </form>
  `,
  styleUrl: './run-sections.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WaterVolumeForm implements OnInit {
  readonly run = input.required<RunView>();
  readonly changed = output<RunView>();
  private readonly api = inject(DayApi);
  private readonly fb = inject(NonNullableFormBuilder);
  protected readonly message = controlMessage;
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly form = this.fb.group({
    mlPer1000Birds: this.fb.control<number | null>(null, [Validators.required, Validators.min(0.01)]),
    ageFromDays: [0],
    ageToDays: [0],
    source: ['label' as 'label' | 'veterinarian'],
  });

  ngOnInit(): void {
    this.form.patchValue({ ageFromDays: this.run().ageDays, ageToDays: this.run().ageDays });
  }

  protected async save(): Promise<void> {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const v = this.form.getRawValue();
    this.busy.set(true);
    this.error.set(null);
    try {
      await firstValueFrom(this.api.addWaterVolume({ productId: this.run().productId, ageFromDays: v.ageFromDays, ageToDays: v.ageToDays, mlPer1000Birds: v.mlPer1000Birds!, source: v.source, note: '' }));
      this.changed.emit(await firstValueFrom(this.api.run(this.run().vaccinationId)));
    } catch (error) {
      this.error.set(applyServerErrors(this.form, error));
    } finally {
      this.busy.set(false);
    }
  }
}
