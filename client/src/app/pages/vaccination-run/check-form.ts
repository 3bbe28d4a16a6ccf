// One readiness check's form: the statements to confirm, or the 12-hour visits, or the expected temperature.
// A visit's time is typed on this site's clock (the crew is here), hinted with the zone's name.
import { ChangeDetectionStrategy, Component, computed, input, output, signal } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatCheckboxModule } from '@angular/material/checkbox';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatRadioModule } from '@angular/material/radio';
import { MatSelectModule } from '@angular/material/select';
import { siteWallTimeToInstant } from '@shared/sites/site-clock.js';
import { attestations, type ReadinessKind } from '@shared/vaccination-day/readiness-kinds.js';
import { siteClockHint } from '../../shared/sites/site-clock-hint';

let nextId = 0;

@Component({
  selector: 'vy-check-form',
  imports: [MatButtonModule, MatCheckboxModule, MatFormFieldModule, MatInputModule, MatRadioModule, MatSelectModule],
  template: `
    @switch (kind()) {
      @case ('twelve_hour') {
        <mat-radio-group [attr.aria-label]="'Other farms, ' + who()" [value]="visited()" (change)="visited.set($event.value)">
          <mat-radio-button [value]="false">No other farm in the last 12 hours</mat-radio-button>
          <mat-radio-button [value]="true">Visited another farm</mat-radio-button>
        </mat-radio-group>
        @if (visited()) {
          <div class="row">
            <mat-form-field><mat-label>Which farm</mat-label><input matInput [value]="farm()" (input)="farm.set($any($event.target).value)" /></mat-form-field>
            <mat-form-field><mat-label>When</mat-label><input matInput type="datetime-local" [value]="farmAt()" (input)="farmAt.set($any($event.target).value)" />
              <mat-hint>{{ farmAtHint() }}</mat-hint></mat-form-field>
          </div>
        }
      }
      @case ('heat') {
        <div class="row">
          <mat-form-field><mat-label>Expected temperature</mat-label><input matInput type="number" inputmode="decimal" [value]="temperature()" (input)="temperature.set($any($event.target).value)" /></mat-form-field>
          <mat-form-field class="unit"><mat-label>Unit</mat-label>
            <mat-select [value]="unit()" (selectionChange)="unit.set($event.value)"><mat-option value="F">°F</mat-option><mat-option value="C">°C</mat-option></mat-select>
          </mat-form-field>
        </div>
      }
      @case ('withdrawal') {
        <p class="hint">Vialyard computes this from the flock's depletion date and the product's withdrawal days.</p>
      }
      @default {
        @for (s of statements(); track s.key) {
          <mat-checkbox [checked]="ticked().has(s.key)" (change)="toggle(s.key, $event.checked)">{{ s.label }}</mat-checkbox>
        }
      }
    }
    <button mat-stroked-button type="button" (click)="submit()" [disabled]="busy()">Record</button>
  `,
  styles: `
    :host { display: flex; flex-direction: column; align-items: flex-start; gap: 4px; }
    .row { display: flex; flex-wrap: wrap; gap: 8px; }
    .unit { width: 96px; }
    .hint { margin: 0; color: var(--mat-sys-on-surface-variant); }
    mat-radio-group { display: flex; flex-direction: column; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CheckForm {
  readonly kind = input.required<ReadinessKind>();
  readonly who = input('');
  readonly busy = input(false);
  /** The vaccination's site's zone. */
  readonly timeZone = input.required<string>();
  readonly answered = output<Record<string, unknown>>();
  protected readonly id = nextId++;
  protected readonly statements = computed(() => Object.entries(attestations[this.kind()] ?? {}).map(([key, label]) => ({ key, label })));
  protected readonly ticked = signal(new Set<string>());
  protected readonly visited = signal(false);
  protected readonly farm = signal('');
  protected readonly farmAt = signal('');
  protected readonly farmAtHint = computed(() => siteClockHint(this.farmAt(), this.timeZone()));
  protected readonly temperature = signal('');
  protected readonly unit = signal<'F' | 'C'>('F');

  protected toggle(key: string, on: boolean): void {
    const next = new Set(this.ticked());
    if (on) next.add(key);
    else next.delete(key);
    this.ticked.set(next);
  }

  protected submit(): void {
    switch (this.kind()) {
      case 'twelve_hour': {
        const at = siteWallTimeToInstant(this.farmAt(), this.timeZone()) ?? new Date();
        this.answered.emit({ visits: this.visited() ? [{ siteId: null, at: at.toISOString(), label: this.farm().trim() || 'another farm' }] : [] });
        return;
      }
      case 'heat': {
        const value = Number(this.temperature());
        this.answered.emit(this.temperature() === '' || !Number.isFinite(value) ? {} : { expectedTemperature: { value, unit: this.unit() } });
        return;
      }
      default:
        this.answered.emit(Object.fromEntries(this.statements().map((s) => [s.key, this.ticked().has(s.key)])));
    }
  }
}
