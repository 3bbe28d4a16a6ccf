// Record birds lost since the last update, or a headcount; each update is kept in the flock's history.
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MAT_DIALOG_DATA, MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { firstValueFrom } from 'rxjs';
import { birdCountKindLabels, birdCountKinds, type BirdCountKind } from '@shared/flocks/bird-count-kinds.js';
import type { FlockView } from '@shared/flocks/flock-schemas.js';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { FlocksApi } from '../../shared/flocks/flocks-api';

@Component({
  selector: 'vy-bird-count-dialog',
  imports: [ReactiveFormsModule, MatDialogModule, MatFormFieldModule, MatInputModule, MatRadioModule, MatButtonModule],
  template: `
    <h2 mat-dialog-title>Record birds · {{ flock.name }}</h2>
    <form [formGroup]="form" (ngSubmit)="save()" novalidate>
      <mat-dialog-content class="content">
        @if (formError(); as error) {
          <p class="form-error" role="alert">{{ error }}</p>
        }
        <p class="hint">{{ flock.currentBirds.toLocaleString() }} birds now.</p>
        <mat-radio-group formControlName="kind" aria-label="What to record" class="row">
          @for (kind of kinds; track kind) {
            <mat-radio-button [value]="kind">{{ kindLabels[kind] }}</mat-radio-button>
          }
        </mat-radio-group>
        <div class="row">
          <mat-form-field>
            <mat-label>{{ form.controls.kind.value === 'count' ? 'Birds counted' : 'Birds lost' }}</mat-label>
            <input matInput type="number" formControlName="birds" min="0" required />
            @if (form.controls.birds.invalid) {
              <mat-error>{{ message(form.controls.birds) }}</mat-error>
            }
          </mat-form-field>
          <mat-form-field>
            <mat-label>Date</mat-label>
            <input matInput type="date" formControlName="countedOn" required />
            @if (form.controls.countedOn.invalid) {
              <mat-error>{{ message(form.controls.countedOn) }}</mat-error>
            }
          </mat-form-field>
        </div>
        <mat-form-field>
          <mat-label>Note</mat-label>
          <input matInput formControlName="note" />
        </mat-form-field>
      </mat-dialog-content>
      <mat-dialog-actions align="end">
        <button mat-button type="button" mat-dialog-close>Cancel</button>
        <button mat-flat-button type="submit" [disabled]="saving()">Record</button>
      </mat-dialog-actions>
    </form>
  `,
  styleUrl: '../../shared/flocks/form-dialog.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class BirdCountDialog {
  protected readonly flock = inject<FlockView>(MAT_DIALOG_DATA);
  private readonly api = inject(FlocksApi);
  private readonly dialogRef = inject(MatDialogRef<BirdCountDialog, FlockView | undefined>);
  protected readonly kinds = birdCountKinds;
  protected readonly kindLabels = birdCountKindLabels;
  protected readonly message = controlMessage;
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  private readonly fb = inject(NonNullableFormBuilder);
  protected readonly form = this.fb.group({
    kind: ['mortality' as BirdCountKind],
    birds: this.fb.control<number | null>(null, [Validators.required, Validators.min(0)]),
    countedOn: [new Date().toLocaleDateString('en-CA'), Validators.required],
    note: [''],
  });

  protected async save(): Promise<void> {
    if (this.form.invalid) return this.form.markAllAsTouched();
    this.saving.set(true);
    this.formError.set(null);
    try {
      this.dialogRef.close(await firstValueFrom(this.api.addBirdCount(this.flock.id, this.form.getRawValue())));
    } catch (error) {
      this.formError.set(applyServerErrors(this.form, error));
    } finally {
      this.saving.set(false);
    }
  }
}
