// One vaccination on the day, step by step: checks → trial → start → vials out → mixing → vials back → record and sign.
// Its times (started, mixed, use by, signed, vials out) are on the site's clock, named, for a crew lead anywhere.
import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { DecimalPipe } from '@angular/common';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { readinessLabels } from '@shared/vaccination-day/readiness-kinds.js';
import { ApiError } from '../../core/http/api-error';
import { StatusChip } from '../../shared/flocks/status-chip';
import { SiteTimePipe } from '../../shared/sites/site-time-pipe';
import { DayApi, type RunView } from '../../shared/vaccination-day/day-api';
import { RunChecks } from './run-checks';
import { RunMixing } from './run-mixing';
import { RunRecord } from './run-record';
import { RunReturns } from './run-returns';
import { RunTrial } from './run-trial';
import { RunVials } from './run-vials';

@Component({
  selector: 'vy-vaccination-run',
  imports: [RouterLink, MatButtonModule, MatIconModule, DecimalPipe, SiteTimePipe, StatusChip, RunChecks, RunTrial, RunVials, RunMixing, RunReturns, RunRecord],
  templateUrl: './vaccination-run.html',
  styleUrl: './run-sections.scss',
  styles: `.narrow { max-width: 720px; } .start { margin: 8px 0; }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class VaccinationRun {
  readonly vaccinationId = input.required<string>();
  private readonly api = inject(DayApi);
  private readonly loaded = rxResource({ params: () => Number(this.vaccinationId()), stream: ({ params }) => this.api.run(params) });
  protected readonly current = signal<RunView | null>(null);
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly loadError = computed(() => (this.loaded.error() ? ApiError.from(this.loaded.error()).message : null));
  protected readonly blockerText = computed(() => (this.current()?.blockers ?? []).map((b) => `${readinessLabels[b.kind]} (${b.why})`));

  constructor() {
    effect(() => {
      const value = this.loaded.value();
      if (value) this.current.set(value);
    });
  }

  protected update(run: RunView): void {
    this.current.set(run);
  }

  protected async start(run: RunView): Promise<void> {
    this.busy.set(true);
    this.error.set(null);
    try {
      this.current.set(await firstValueFrom(this.api.step(run.vaccinationId, 'start')));
    } catch (error) {
      this.error.set(ApiError.from(error).message);
    } finally {
      this.busy.set(false);
    }
  }
}
