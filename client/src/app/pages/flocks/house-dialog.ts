// Add or change a house: its name, how birds are kept in it, what it is built for, whether it is in use.
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { firstValueFrom } from 'rxjs';
import type { HouseView } from '@shared/flocks/house-schemas.js';
import { housingLabels, housings, type Housing } from '@shared/flocks/housings.js';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { FlocksApi } from '../../shared/flocks/flocks-api';

export interface HouseDialogData {
  siteId: number;
  house: HouseView | null;
}

@Component({
  selector: 'vy-house-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatSelectModule, MatSlideToggleModule, MatButtonModule],
  template: `
    <h2 mat-dialog-title>{{ data.house ? 'Edit ' + data.house.name : 'New house' }}</h2>
    <form [formGroup]="form" (ngSubmit)="save()" novalidate>
      <mat-dialog-content class="content">
        @if (formError(); as error) {
          <p class="form-error" role="alert">{{ error }}</p>
        }
        <mat-form-field>
          <mat-label>Name</mat-label>
          <input matInput formControlName="name" required />
          @if (form.controls.name.invalid) {
            <mat-error>{{ message(form.controls.name) }}</mat-error>
          }
        </mat-form-field>
        <div class="row">
          <mat-form-field>
            <mat-label>Housing</mat-label>
            <mat-select formControlName="housing" required>
              @for (housing of housings; track housing) {
                <mat-option [value]="housing">{{ labels[housing] }}</mat-option>
              }
            </mat-select>
          </mat-form-field>
          <mat-form-field>
            <mat-label>Capacity (birds)</mat-label>
            <input matInput type="number" formControlName="capacity" min="1" />
            @if (form.controls.capacity.invalid) {
              <mat-error>{{ message(form.controls.capacity) }}</mat-error>
            }
          </mat-form-field>
        </div>
        @if (data.house) {
          <mat-slide-toggle formControlName="active">In use</mat-slide-toggle>
          @if (form.controls.active.errors?.['server']; as problem) {
            <p class="form-error" role="alert">{{ problem }}</p>
          }
        }
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>Cancel</button>
        <button mat-flat-button type="submit" [disabled]="saving()">Save house</button>
      </mat-dialog-actions>
    </form>
  `,
  styleUrl: '../../shared/flocks/form-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class HouseDialog {
  protected readonly data = inject<HouseDialogData>(MAT_DIALOG_DATA);
  private readonly api = inject(FlocksApi);
  private readonly dialogRef = inject(MatDialogRef<HouseDialog, boolean>);
  protected readonly housings = housings;
  protected readonly labels = housingLabels;
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  private readonly fb = inject(NonNullableFormBuilder);
  protected readonly form = this.fb.group({
    name: [this.data.house?.name ?? '', [Validators.required, Validators.maxLength(60)]],
    housing: [this.data.house?.housing ?? ('cage' as Housing), Validators.required],
    capacity: this.fb.control<number | null>(this.data.house?.capacity ?? null, Validators.min(1)),
    active: [this.data.house?.active ?? true],
  });

  protected async save(): Promise<void> {
    if (this.form.invalid) return this.form.markAllAsTouched();
    this.saving.set(true);
    this.formError.set(null);
    try {
      await firstValueFrom(this.api.saveHouse(this.data.siteId, this.data.house?.id ?? null, this.form.getRawValue()));
      this.dialogRef.close(true);
    } catch (error) {
      this.formError.set(applyServerErrors(this.form, error));
    } finally {
      this.saving.set(false);
    }
  }
}
