// The crew lead's day sheet: the day's confirmed vaccinations in visit order, each with birds, doses, the vials to take and the water.
import { ChangeDetectionStrategy, Component, computed, effect, signal, untracked } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { DecimalPipe } from '@angular/common';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { AuthStore } from '../../core/auth/auth-store';
import { RouterLink } from '@angular/router';
import { inject } from '@angular/core';
import { StatusChip } from '../../shared/flocks/status-chip';
import { DayApi } from '../../shared/vaccination-day/day-api';
import { localDay } from '../../shared/vaccination-day/local-day';
import { CrewForm } from './crew-form';

@Component({
  selector: 'vy-day-sheet',
  imports: [MatCardModule, MatButtonModule, MatIconModule, MatFormFieldModule, MatInputModule, MatSelectModule, RouterLink, DecimalPipe, StatusChip, CrewForm],
  templateUrl: './day-sheet.html',
  styleUrl: './day-sheet.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DaySheetPage {
  private readonly api = inject(DayApi);
  private readonly auth = inject(AuthStore);
  protected readonly day = signal(localDay());
  /** Admins and veterinarians choose whose sheet to read; null is one's own. */
  protected readonly leadId = signal<number | null>(null);
  protected readonly planner = computed(() => {
    this.auth.user();
    return this.auth.hasRole('admin', 'veterinarian');
  });
  protected readonly leads = rxResource({ params: () => (this.planner() ? this.day() : undefined), stream: ({ params }) => this.api.leads(params) });
  protected readonly sheet = rxResource({ params: () => ({ day: this.day(), leadId: this.leadId() }), stream: ({ params }) => this.api.sheet(params.day, params.leadId) });

  /** Whether the planner chose a sheet themselves; until then the first lead of the day is shown (a planner rarely leads a crew). */
  private chosen = false;

  constructor() {
    effect(() => {
      const leads = this.leads.value() ?? [];
      untracked(() => {
        if (!this.chosen) this.leadId.set(leads[0]?.id ?? null);
      });
    });
  }

  protected chooseLead(id: number): void {
    this.chosen = true;
    this.leadId.set(id || null);
  }

  protected pick(value: string): void {
    if (/^\d{4}-\d{2}-\d{2}$/.test(value)) this.day.set(value);
  }
}
