// The receiving home: shipments expected today and overdue, the shipment in progress on this phone, and recent arrivals.
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource, toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatSelectModule } from '@angular/material/select';
import { ActivatedRoute, RouterLink } from '@angular/router';
import { AuthStore } from '../../core/auth/auth-store';
import { SitesApi } from '../../core/sites/sites-api';
import { OutcomeChip } from '../../shared/receiving/outcome-chip';
import { ReceivingApi } from '../../shared/receiving/receiving-api';
import { ReceivingDraftStore } from '../receive-shipment/receiving-draft-store';
import { CountPipe } from '../../shared/text/count-pipe';
import { SiteTimePipe } from '../../shared/sites/site-time-pipe';

const dueLabels = { overdue: 'Overdue', today: 'Due today', later: 'Coming' } as const;

@Component({
  selector: 'vy-receiving',
  imports: [MatButtonModule, MatCardModule, MatIconModule, MatFormFieldModule, MatSelectModule, RouterLink, SiteTimePipe, OutcomeChip, CountPipe],
  templateUrl: './receiving.html',
  styleUrl: './receiving.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Receiving {
  private readonly api = inject(ReceivingApi);
  private readonly auth = inject(AuthStore);
  private readonly drafts = inject(ReceivingDraftStore);
  protected readonly sites = toSignal(inject(SitesApi).list(), { initialValue: [] });
  /** A link may name the site (`?site=`, as the home card's do); else the first of the user's sites. */
  protected readonly chosenSite = signal<number | null>(Number(inject(ActivatedRoute).snapshot.queryParamMap.get('site')) || null);
  protected readonly siteId = computed(() => this.sites().find((site) => site.id === this.chosenSite())?.id ?? this.sites()[0]?.id ?? null);
  protected readonly canReceive = computed(() => {
    this.auth.user();
    return this.auth.hasRole('admin', 'receiving');
  });
  protected readonly dueLabels = dueLabels;
  private readonly zones = computed(() => new Map(this.sites().map((site) => [site.id, site.timeZone])));

  protected readonly expected = rxResource({ params: () => this.siteId() ?? undefined, stream: ({ params }) => this.api.expected(params) });
  protected readonly recent = rxResource({ params: () => this.siteId() ?? undefined, stream: ({ params }) => this.api.recent(params) });
  protected readonly draft = signal(this.drafts.peek());
  protected readonly dueNow = computed(() => (this.expected.value() ?? []).filter((order) => order.due !== 'later'));
  protected readonly comingUp = computed(() => (this.expected.value() ?? []).filter((order) => order.due === 'later'));

  /** A shipment arrived at its site: its time reads on that site's clock (the sites list carries each zone). */
  protected zoneOf(siteId: number): string | undefined {
    return this.zones().get(siteId);
  }

  protected async discardDraft(): Promise<void> {
    await this.drafts.discard();
    this.draft.set(null);
  }
}
