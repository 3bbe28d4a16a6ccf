// The record: birds vaccinated, vials used per lot (issued = used + returned), deviations, the sprayer's cleaning checklist (spray only), signed by the crew lead.
import { ChangeDetectionStrategy, Component, computed, effect, inject, untracked } from '@angular/core';
import { FormArray, NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { noSprayerText, usesSprayer } from '@shared/vaccination-day/sprayer.js';
import { SiteTimePipe } from '../../shared/sites/site-time-pipe';
import { RunStep } from './run-step';

@Component({
  selector: 'vy-run-record',
  imports: [ReactiveFormsModule, MatButtonModule, MatCheckboxModule, MatFormFieldModule, MatInputModule, SiteTimePipe],
  template: `
    <section aria-labelledby="record-title">
      <h2 id="record-title">6. Record and sign</h2>
      @if (run().record; as r) {
        <p>Signed by {{ r.signerName }} at {{ r.signedAt | siteTime: run().timeZone : 'time' }}: {{ r.birdsVaccinated }} birds vaccinated. This vaccination is done.</p>
        <a mat-stroked-button [href]="'/api/vaccination-day/flocks/' + run().flockId + '/history.pdf'" target="_blank" rel="noopener">The flock's vaccination record</a>
      } @else if (run().startedAt && run().status === 'confirmed') {
        <form [formGroup]="form" (ngSubmit)="sign()" novalidate class="fields">
          @if (error(); as e) { <p class="form-error" role="alert">{{ e }}</p> }
          <mat-form-field><mat-label>Birds vaccinated</mat-label><input matInput type="number" inputmode="numeric" formControlName="birdsVaccinated" required />
            @if (form.controls.birdsVaccinated.invalid) { <mat-error>{{ message(form.controls.birdsVaccinated) }}</mat-error> }</mat-form-field>
          <div formArrayName="lots">
            @for (lot of run().lotsOut; track lot.lotId + ':' + lot.issued + ':' + lot.returned; let i = $index) {
              <mat-form-field [formGroupName]="i"><mat-label>Lot {{ lot.lotNumber }}: vials used (opened)</mat-label>
                <input matInput type="number" inputmode="numeric" formControlName="vialsUsed" />
                <mat-hint>{{ lot.issued }} issued, {{ lot.returned }} returned</mat-hint></mat-form-field>
            }
          </div>
          @if (form.controls.lots.invalid) { <p class="form-error">{{ message(form.controls.lots) }}</p> }
          @if (sprayed()) {
          <fieldset formGroupName="cleaning">
            <legend>Cleaning</legend>
            <mat-checkbox formControlName="disassembled">Sprayer taken apart</mat-checkbox>
            <mat-checkbox formControlName="washed">Washed with mild detergent and water, no disinfectant</mat-checkbox>
            <mat-checkbox formControlName="tankDried">Tank dried</mat-checkbox>
            <mat-checkbox formControlName="batteryRecharging">Battery on charge</mat-checkbox>
          </fieldset>
          } @else {
            <p class="who">{{ noSprayer() }} No sprayer cleaning to record.</p>
          }
          <mat-form-field><mat-label>Deviations</mat-label><textarea matInput rows="2" formControlName="deviations"></textarea></mat-form-field>
          <mat-form-field><mat-label>Your password, to sign</mat-label><input matInput type="password" autocomplete="current-password" formControlName="password" required />
            @if (form.controls.password.invalid) { <mat-error>{{ message(form.controls.password) }}</mat-error> }</mat-form-field>
          <p class="who">Signing means: {{ meaning }}</p>
          <div><button mat-flat-button type="submit" [disabled]="busy()">Sign the record</button></div>
        </form>
      }
    </section>
  `,
  styleUrl: './run-sections.scss',
  styles: `fieldset { border: 0; padding: 0; margin: 8px 0; display: flex; flex-direction: column; } legend { font: var(--mat-sys-title-small); }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RunRecord extends RunStep {
  protected readonly meaning = 'I led this vaccination and this record is true and complete.';
  private readonly fb = inject(NonNullableFormBuilder);
  // The cleaning checklist is the sprayer's: asked of a spray vaccination only.
  protected readonly sprayed = computed(() => usesSprayer(this.run().route));
  protected readonly noSprayer = computed(() => noSprayerText(this.run().route));
  protected readonly form = this.fb.group({
    birdsVaccinated: this.fb.control<number | null>(null, [Validators.required, Validators.min(0)]),
    lots: new FormArray<ReturnType<RunRecord['lotGroup']>>([]),
    cleaning: this.fb.group({ disassembled: [false], washed: [false], tankDried: [false], batteryRecharging: [false] }),
    deviations: [''],
    password: ['', Validators.required],
  });

  constructor() {
    super();
    effect(() => {
      const lots = this.run().lotsOut;
      // The rows below are re-created with the controls (see the @for track), so each binds to its new control.
      untracked(() => {
        const array = this.form.controls.lots;
        array.clear();
        for (const lot of lots) array.push(this.lotGroup(lot.lotId, lot.out));
        if (this.form.controls.birdsVaccinated.value === null) this.form.controls.birdsVaccinated.setValue(this.run().birds);
      });
    });
  }

  private lotGroup(lotId: number, used: number) {
    return this.fb.group({ lotId: [lotId], vialsUsed: [used, [Validators.required, Validators.min(0)]] });
  }

  protected sign(): void {
    const { cleaning, ...v } = this.form.getRawValue();
    void this.send('record', { ...v, birdsVaccinated: v.birdsVaccinated, ...(this.sprayed() ? { cleaning } : {}) }, this.form);
  }
}
