// The mixing sheet on screen: vials, doses, water, the label's use-within time counting down from mixing, the cautions.
import { ChangeDetectionStrategy, Component, DestroyRef, computed, inject, signal } from '@angular/core';
import { DecimalPipe } from '@angular/common';
import { MatButtonModule } from '@angular/material/button';
import { AuthStore } from '../../core/auth/auth-store';
import { WaterVolumeForm } from './water-volume-form';
import { followLabel, mixingCautions } from '@shared/vaccination-day/mixing-cautions.js';
import { SiteTimePipe } from '../../shared/sites/site-time-pipe';
import { RunStep } from './run-step';

@Component({
  selector: 'vy-run-mixing',
  imports: [MatButtonModule, DecimalPipe, SiteTimePipe, WaterVolumeForm],
  template: `
    <section aria-labelledby="mixing-title">
      <h2 id="mixing-title">4. Mixing sheet</h2>
      <dl class="facts">
        <dt>Birds</dt><dd>{{ run().birds | number }}</dd>
        <dt>Doses</dt><dd>{{ run().dosesNeeded | number }}</dd>
        <dt>Vials out</dt><dd>{{ vialsOut() }} ({{ dosesOut() | number }} doses)</dd>
        <dt>Water</dt>
        <dd>
          @if (run().waterMl !== null) {
            {{ run().waterMl | number }} mL ({{ run().waterMlPer1000 | number }} mL per 1,000 birds, from the {{ run().waterSource }})
          } @else {
            Not recorded: take it from the label or ask the veterinarian.
          }
        </dd>
        <dt>Use within</dt><dd>{{ run().useWithinMinutes === null ? 'see the label' : run().useWithinMinutes + ' minutes from mixing' }}</dd>
      </dl>
      @if (run().waterMl === null && run().status === 'confirmed' && waterKeeper()) {
        <vy-water-volume-form [run]="run()" (changed)="changed.emit($event)" />
      }
      @if (run().status === 'confirmed' && run().useBy; as useBy) {
        <p class="countdown" [class.late]="left() < 0" role="timer" aria-live="off">{{ countdown() }}</p>
        <p class="who">Mixed {{ run().mixedAt | siteTime: run().timeZone : 'time' }}; use by {{ useBy | siteTime: run().timeZone : 'time' }}.</p>
      }
      <ul class="plain">
        @for (c of cautions; track c) { <li>{{ c }}</li> }
      </ul>
      <p><strong>{{ follow }}</strong></p>
      <div class="row">
        @if (run().status === 'confirmed' && vialsOut() > 0) {
          <button mat-flat-button type="button" (click)="mix()" [disabled]="busy()">{{ run().mixedAt ? 'Mixed another batch' : 'Mixed now' }}</button>
        }
        <a mat-stroked-button [href]="api.mixingSheetUrl(run().vaccinationId)" target="_blank" rel="noopener">Print the mixing sheet</a>
      </div>
      @if (error(); as e) { <p class="form-error" role="alert">{{ e }}</p> }
    </section>
  `,
  styleUrl: './run-sections.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RunMixing extends RunStep {
  protected readonly cautions = mixingCautions;
  protected readonly follow = followLabel;
  private readonly now = signal(Date.now());
  private readonly auth = inject(AuthStore);
  protected readonly waterKeeper = computed(() => {
    this.auth.user();
    return this.auth.hasRole('admin', 'veterinarian');
  });
  protected readonly vialsOut = computed(() => this.run().lotsOut.reduce((n, l) => n + l.out, 0));
  protected readonly dosesOut = computed(() => this.run().lotsOut.reduce((n, l) => n + l.out * l.dosesPerVial, 0));
  protected readonly left = computed(() => (this.run().useBy ? Date.parse(this.run().useBy!) - this.now() : 0));
  protected readonly countdown = computed(() => {
    const ms = this.left();
    if (ms < 0) return `Past the use-by time by ${Math.ceil(-ms / 60_000)} min: ask the veterinarian.`;
    const total = Math.floor(ms / 1000);
    return `${Math.floor(total / 60)}:${String(total % 60).padStart(2, '0')} left`;
  });

  constructor() {
    super();
    const timer = setInterval(() => this.now.set(Date.now()), 1000);
    inject(DestroyRef).onDestroy(() => clearInterval(timer));
  }

  protected mix(): void {
    void this.send('mixings', {});
  }
}
