// The readiness checks of a vaccination: each crew member's own, then the vaccination's; a veterinarian may override a failed one.
import { ChangeDetectionStrategy, Component, computed, inject, input, output, signal } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { memberCheckKinds, readinessLabels, vaccinationCheckKindsFor, type ReadinessKind } from '@shared/vaccination-day/readiness-kinds.js';
import { AuthStore } from '../../core/auth/auth-store';
import { ApiError } from '../../core/http/api-error';
import { StatusChip } from '../../shared/flocks/status-chip';
import { SiteTimePipe } from '../../shared/sites/site-time-pipe';
import { DayApi, type CheckView, type RunView } from '../../shared/vaccination-day/day-api';
import { CheckForm } from './check-form';

interface Row {
  key: string;
  kind: ReadinessKind;
  memberId: number | null;
  who: string;
  latest: CheckView | undefined;
}

@Component({
  selector: 'vy-run-checks',
  imports: [CheckForm, StatusChip, MatButtonModule, MatFormFieldModule, MatInputModule, SiteTimePipe],
  templateUrl: './run-checks.html',
  styleUrl: './run-sections.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RunChecks {
  readonly run = input.required<RunView>();
  readonly changed = output<RunView>();
  private readonly api = inject(DayApi);
  private readonly auth = inject(AuthStore);
  protected readonly labels = readinessLabels;
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly reasons = signal<Partial<Record<number, string>>>({});
  protected readonly isVet = computed(() => {
    this.auth.user();
    return this.auth.hasRole('veterinarian');
  });

  protected readonly rows = computed<Row[]>(() => {
    const run = this.run();
    if (!run.crew) return [];
    const latest = (kind: ReadinessKind, memberId: number | null) => run.checks.filter((c) => c.kind === kind && c.memberId === memberId).at(-1);
    const people = [{ id: run.crew.leadId, name: run.crew.leadName }, ...run.crew.members];
    return [
      ...people.flatMap((p) => memberCheckKinds.map((kind) => ({ key: `${kind}:${p.id}`, kind, memberId: p.id, who: p.name, latest: latest(kind, p.id) }))),
      ...vaccinationCheckKindsFor(run.route).map((kind) => ({ key: kind, kind, memberId: null, who: '', latest: latest(kind, null) })),
    ];
  });

  protected async record(row: Row, answers: Record<string, unknown>): Promise<void> {
    const run = this.run();
    const body = row.memberId === null ? { kind: row.kind, answers } : { kind: row.kind, answers, day: run.plannedDate, memberId: row.memberId };
    await this.send(row.memberId === null ? 'checks' : 'member-checks', body);
  }

  protected setReason(id: number, value: string): void {
    this.reasons.set({ ...this.reasons(), [id]: value });
  }

  protected async override(check: CheckView): Promise<void> {
    await this.send(`checks/${check.id}/override`, { reason: this.reasons()[check.id] ?? '' });
  }

  private async send(path: string, body: object): Promise<void> {
    this.busy.set(true);
    this.error.set(null);
    try {
      this.changed.emit(await firstValueFrom(this.api.step(this.run().vaccinationId, path, body)));
    } catch (error) {
      const e = ApiError.from(error);
      this.error.set([e.message, ...e.fields.map((f) => f.message)].join(' '));
    } finally {
      this.busy.set(false);
    }
  }
}
