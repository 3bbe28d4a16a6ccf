// Unopened vials back to the fridge with their time out; past the product's limit (or with none known) they go back on hold.
import { ChangeDetectionStrategy, Component, computed, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import type { LotOut } from '../../shared/vaccination-day/day-api';
import { SiteTimePipe } from '../../shared/sites/site-time-pipe';
import { RunStep } from './run-step';

@Component({
  selector: 'vy-run-returns',
  imports: [MatButtonModule, MatCheckboxModule, MatFormFieldModule, MatInputModule, SiteTimePipe],
  template: `
    <section aria-labelledby="returns-title">
      <h2 id="returns-title">5. Vials back</h2>
      <p class="who">Opened vials are used: they never go back. {{ limitText() }}</p>
      @if (error(); as e) { <p class="form-error" role="alert">{{ e }}</p> }
      @for (l of out(); track l.lotId) {
        <div class="row">
          <span>Lot {{ l.lotNumber }}: {{ l.out }} out since {{ l.leftAt | siteTime: run().timeZone : 'time' }}</span>
          <mat-form-field><mat-label>Unopened vials back</mat-label>
            <input matInput type="number" inputmode="numeric" min="1" [max]="l.out" [value]="counts()[l.lotId] ?? ''" (input)="setCount(l.lotId, $any($event.target).value)" /></mat-form-field>
          <mat-checkbox [checked]="unopened()[l.lotId] ?? false" (change)="setUnopened(l.lotId, $event.checked)">These vials are unopened</mat-checkbox>
          <button mat-stroked-button type="button" (click)="back(l)" [disabled]="busy()">Back to the fridge</button>
        </div>
      } @empty {
        <p>No vial is out.</p>
      }
    </section>
  `,
  styleUrl: './run-sections.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RunReturns extends RunStep {
  protected readonly out = computed(() => (this.run().status === 'confirmed' ? this.run().lotsOut.filter((l) => l.out > 0) : []));
  protected readonly counts = signal<Partial<Record<number, string>>>({});
  protected readonly unopened = signal<Partial<Record<number, boolean>>>({});
  protected readonly limitText = computed(() =>
    this.run().timeOutLimitMinutes === null
      ? 'This product has no time-out limit recorded: returned vials go on hold for the veterinarian.'
      : `Back within ${this.run().timeOutLimitMinutes} minutes they go straight to stock; later, on hold for the veterinarian.`,
  );

  protected setCount(lotId: number, value: string): void {
    this.counts.set({ ...this.counts(), [lotId]: value });
  }

  protected setUnopened(lotId: number, value: boolean): void {
    this.unopened.set({ ...this.unopened(), [lotId]: value });
  }

  protected async back(lot: LotOut): Promise<void> {
    const vials = Number(this.counts()[lot.lotId] ?? '');
    if (await this.send('returns', { lotId: lot.lotId, vials, unopened: this.unopened()[lot.lotId] === true })) {
      this.setCount(lot.lotId, '');
      this.setUnopened(lot.lotId, false);
    }
  }
}
