// The sprayer trial on water-sensitive paper (spray vaccinations only): acceptable, or adjusted and retested; nozzle height and walking pace.
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { firstValueFrom } from 'rxjs';
import { noSprayerText, usesSprayer } from '@shared/vaccination-day/sprayer.js';
import { ApiError } from '../../core/http/api-error';
import { RunStep } from './run-step';

@Component({
  selector: 'vy-run-trial',
  imports: [ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatInputModule, MatRadioModule],
  template: `
    <section aria-labelledby="trial-title">
      <h2 id="trial-title">2. Sprayer trial</h2>
      @if (!sprayed()) {
        <p>{{ noSprayer() }}</p>
      } @else {
      @if (error(); as e) { <p class="form-error" role="alert">{{ e }}</p> }
      @if (run().trial; as t) {
        <p>{{ t.result === 'acceptable' ? 'Acceptable' : 'Adjusted and retested' }} · nozzle {{ t.nozzleHeightCm }} cm · {{ t.walkingPaceMPerMin }} m/min{{ t.notes ? ' · ' + t.notes : '' }}</p>
      }
      @if (run().trial; as t) {
        @for (id of t.photoIds; track id) {
          <img class="paper" [src]="api.trialPhotoUrl(id)" alt="Water-sensitive paper from the trial" />
        }
        @if (run().status === 'confirmed' && t.photoIds.length < 3) {
          <label class="photo">
            <span>Add a photo of the paper (optional)</span>
            <input type="file" accept="image/*" capture="environment" (change)="photo($event)" [disabled]="busy()" />
          </label>
        }
      }
      @if (run().status === 'confirmed' && run().trial && !again()) {
        <button mat-button type="button" (click)="again.set(true)">Record another trial</button>
      }
      @if (run().status === 'confirmed' && (!run().trial || again())) {
        <p class="who">Spray water on water-sensitive paper; adjust the nozzles, height and walking pace until the coarse pattern is right.</p>
        <form [formGroup]="form" (ngSubmit)="save()" novalidate class="fields">
          <mat-radio-group formControlName="result" aria-label="Trial result">
            <mat-radio-button value="acceptable">Acceptable</mat-radio-button>
            <mat-radio-button value="adjusted_retested">Adjusted and retested</mat-radio-button>
          </mat-radio-group>
          <mat-form-field><mat-label>Nozzle height (cm)</mat-label><input matInput type="number" inputmode="decimal" formControlName="nozzleHeightCm" required />
            @if (form.controls.nozzleHeightCm.invalid) { <mat-error>{{ message(form.controls.nozzleHeightCm) }}</mat-error> }</mat-form-field>
          <mat-form-field><mat-label>Walking pace (m per minute)</mat-label><input matInput type="number" inputmode="decimal" formControlName="walkingPaceMPerMin" required />
            @if (form.controls.walkingPaceMPerMin.invalid) { <mat-error>{{ message(form.controls.walkingPaceMPerMin) }}</mat-error> }</mat-form-field>
          <mat-form-field><mat-label>Notes</mat-label><input matInput formControlName="notes" /></mat-form-field>
          <div><button mat-stroked-button type="submit" [disabled]="busy()">Record the trial</button></div>
        </form>
      }
      }
    </section>
  `,
  styleUrl: './run-sections.scss',
  styles: `.paper { display: block; max-width: 100%; max-height: 200px; border-radius: 8px; margin: 4px 0; } .photo { display: flex; flex-direction: column; gap: 4px; margin: 8px 0; }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RunTrial extends RunStep {
  private readonly fb = inject(NonNullableFormBuilder);
  protected readonly form = this.fb.group({
    result: ['acceptable' as 'acceptable' | 'adjusted_retested'],
    nozzleHeightCm: this.fb.control<number | null>(null, [Validators.required, Validators.min(0.1)]),
    walkingPaceMPerMin: this.fb.control<number | null>(null, [Validators.required, Validators.min(0.1)]),
    notes: [''],
  });

  protected readonly again = signal(false);
  // Only a spray vaccination has a sprayer to try; any other route skips the step.
  protected readonly sprayed = computed(() => usesSprayer(this.run().route));
  protected readonly noSprayer = computed(() => noSprayerText(this.run().route));

  protected async photo(event: Event): Promise<void> {
    const input = event.target as HTMLInputElement;
    const file = input.files?.[0];
    if (!file) return;
    this.busy.set(true);
    this.error.set(null);
    try {
      this.changed.emit(await firstValueFrom(this.api.addTrialPhoto(this.run().vaccinationId, file)));
    } catch (error) {
      this.error.set(ApiError.from(error).message);
    } finally {
      this.busy.set(false);
      input.value = '';
    }
  }

  protected async save(): Promise<void> {
    if (await this.send('trial', this.form.getRawValue(), this.form)) this.again.set(false);
  }
}
