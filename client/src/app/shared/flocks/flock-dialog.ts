// Place a flock in a house or change one: dates (age follows the hatch date), birds placed, planned depletion, programme.
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { firstValueFrom } from 'rxjs';
import type { FlockView } from '@shared/flocks/flock-schemas.js';
import type { HouseView } from '@shared/flocks/house-schemas.js';
import type { ProgrammeView } from '@shared/flocks/programme-schemas.js';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { FlocksApi } from './flocks-api';

export interface FlockDialogData {
  houses: HouseView[];
  programmes: ProgrammeView[];
  flock: FlockView | null;
}

@Component({
  selector: 'vy-flock-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatSelectModule, MatButtonModule],
  template: `
    <h2 mat-dialog-title>{{ data.flock ? 'Edit flock ' + data.flock.name : 'Place a flock' }}</h2>
    <form [formGroup]="form" (ngSubmit)="save()" novalidate>
      <mat-dialog-content class="content">
        @if (formError(); as error) {
          <p class="form-error" role="alert">{{ error }}</p>
        }
        <div class="row">
          <mat-form-field>
            <mat-label>House</mat-label>
            <mat-select formControlName="houseId" required>
              @for (house of activeHouses; track house.id) {
                <mat-option [value]="house.id">{{ house.name }}</mat-option>
              }
            </mat-select>
            @if (capacity(); as birds) {
              <mat-hint>Built for {{ birds.toLocaleString() }} birds</mat-hint>
            }
            @if (form.controls.houseId.invalid) {
              <mat-error>{{ message(form.controls.houseId) }}</mat-error>
            }
          </mat-form-field>
          <mat-form-field>
            <mat-label>Flock name</mat-label>
            <input matInput formControlName="name" required />
            @if (form.controls.name.invalid) {
              <mat-error>{{ message(form.controls.name) }}</mat-error>
            }
          </mat-form-field>
        </div>
        <div class="row">
          <mat-form-field>
            <mat-label>Hatch date</mat-label>
            <input matInput type="date" formControlName="hatchDate" required />
            @if (form.controls.hatchDate.invalid) {
              <mat-error>{{ message(form.controls.hatchDate) }}</mat-error>
            }
          </mat-form-field>
          <mat-form-field>
            <mat-label>Placement date</mat-label>
            <input matInput type="date" formControlName="placementDate" required />
            @if (form.controls.placementDate.invalid) {
              <mat-error>{{ message(form.controls.placementDate) }}</mat-error>
            }
          </mat-form-field>
        </div>
        <div class="row">
          <mat-form-field>
            <mat-label>Birds placed</mat-label>
            <input matInput type="number" formControlName="birdsPlaced" min="1" required />
            @if (form.controls.birdsPlaced.invalid) {
              <mat-error>{{ message(form.controls.birdsPlaced, { min: 'At least 1 bird.' }) }}</mat-error>
            }
          </mat-form-field>
          <mat-form-field>
            <mat-label>Planned depletion</mat-label>
            <input matInput type="date" formControlName="plannedDepletionDate" />
            <mat-hint>Vaccinations too close to it are flagged</mat-hint>
            @if (form.controls.plannedDepletionDate.invalid) {
              <mat-error>{{ message(form.controls.plannedDepletionDate) }}</mat-error>
            }
          </mat-form-field>
        </div>
        <mat-form-field>
          <mat-label>Vaccination programme</mat-label>
          <mat-select formControlName="programmeId">
            <mat-option [value]="null">None</mat-option>
            @for (programme of programmes; track programme.id) {
              <mat-option [value]="programme.id">{{ programme.name }}</mat-option>
            }
          </mat-select>
          <mat-hint>Its steps become planned vaccinations; you can move each one afterwards</mat-hint>
          @if (form.controls.programmeId.invalid) {
            <mat-error>{{ message(form.controls.programmeId) }}</mat-error>
          }
        </mat-form-field>
        <mat-form-field>
          <mat-label>Notes</mat-label>
          <textarea matInput formControlName="notes" rows="2"></textarea>
        </mat-form-field>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>Cancel</button>
        <button mat-flat-button type="submit" [disabled]="saving()">{{ data.flock ? 'Save flock' : 'Place flock' }}</button>
      </mat-dialog-actions>
    </form>
  `,
  styleUrl: './form-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FlockDialog {
  protected readonly data = inject<FlockDialogData>(MAT_DIALOG_DATA);
  private readonly api = inject(FlocksApi);
  private readonly dialogRef = inject(MatDialogRef<FlockDialog, FlockView | undefined>);
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  protected readonly activeHouses = this.data.houses.filter((house) => house.active || house.id === this.data.flock?.houseId);
  protected readonly programmes = this.data.programmes.filter((p) => p.active || p.id === this.data.flock?.programmeId);

  private readonly fb = inject(NonNullableFormBuilder);
  protected readonly form = this.fb.group({
    houseId: this.fb.control<number | null>({ value: this.data.flock?.houseId ?? null, disabled: this.data.flock !== null }, Validators.required),
    name: [this.data.flock?.name ?? '', [Validators.required, Validators.maxLength(60)]],
    hatchDate: [this.data.flock?.hatchDate ?? '', Validators.required],
    placementDate: [this.data.flock?.placementDate ?? '', Validators.required],
    birdsPlaced: this.fb.control<number | null>(this.data.flock?.birdsPlaced ?? null, [Validators.required, Validators.min(1)]),
    plannedDepletionDate: [this.data.flock?.plannedDepletionDate ?? ''],
    programmeId: this.fb.control<number | null>(this.data.flock?.programmeId ?? null),
    notes: [this.data.flock?.notes ?? ''],
  });
  private readonly houseId = toSignal(this.form.controls.houseId.valueChanges, { initialValue: this.form.controls.houseId.value });
  protected readonly capacity = computed(() => this.data.houses.find((h) => h.id === this.houseId())?.capacity ?? null);

  protected async save(): Promise<void> {
    if (this.form.invalid) return this.form.markAllAsTouched();
    const { houseId, plannedDepletionDate, ...value } = this.form.getRawValue();
    const input = { ...value, plannedDepletionDate: plannedDepletionDate || null };
    this.saving.set(true);
    this.formError.set(null);
    try {
      const saved = this.data.flock
        ? await firstValueFrom(this.api.updateFlock(this.data.flock.id, input))
        : await firstValueFrom(this.api.createFlock(houseId!, input));
      this.dialogRef.close(saved);
    } catch (error) {
      this.formError.set(applyServerErrors(this.form, error));
    } finally {
      this.saving.set(false);
    }
  }
}
