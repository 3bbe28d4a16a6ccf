// The lots list: search by lot number, filter by product, site, fridge, status and expiry; earliest expiry first.
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource, toSignal } from '@angular/core/rxjs-interop';
import { DecimalPipe } from '@angular/common';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatPaginatorModule, type PageEvent } from '@angular/material/paginator';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { RouterLink } from '@angular/router';
import { lotSortLabels, lotSorts, lotStatusLabels, lotStatuses } from '@shared/lots/lot-list-options.js';
import type { LotStatus } from '@shared/lots/lot-status.js';
import { LotStatusChip } from '../../shared/lots/lot-status-chip';
import { LotsApi, type LotListItem, type LotListRequest } from '../../shared/lots/lots-api';

@Component({
  selector: 'vy-lots',
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInputModule, MatSelectModule, MatButtonModule, MatIconModule, MatPaginatorModule, MatProgressBarModule, RouterLink, DecimalPipe, LotStatusChip],
  templateUrl: './lots.html',
  styleUrl: './lots.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Lots {
  private readonly api = inject(LotsApi);
  protected readonly options = toSignal(this.api.filters());
  protected readonly statuses = lotStatuses;
  protected readonly statusLabels = lotStatusLabels;
  protected readonly sorts = lotSorts;
  protected readonly sortLabels = lotSortLabels;

  protected readonly form = inject(NonNullableFormBuilder).group({
    q: [''],
    productId: [null as number | null],
    siteId: [null as number | null],
    fridgeId: [null as number | null],
    status: ['' as LotStatus | ''],
    expiryFrom: [''],
    expiryTo: [''],
    sort: ['expiry'],
  });
  private readonly siteChoice = toSignal(this.form.controls.siteId.valueChanges, { initialValue: null });
  /** The fridges of the chosen site (all of the user's when no site is chosen). */
  protected readonly fridges = computed(() => (this.options()?.fridges ?? []).filter((f) => this.siteChoice() === null || f.siteId === this.siteChoice()));

  /** On a phone the filters beyond the lot number start folded away, so the lots show without scrolling past them. */
  protected readonly showAll = signal(typeof matchMedia === 'undefined' || matchMedia('(min-width: 700px)').matches);

  protected readonly request = signal<LotListRequest>({ sort: 'expiry', page: 1, pageSize: 25 });
  protected readonly lots = rxResource({ params: () => this.request(), stream: ({ params }) => this.api.list(params) });

  protected apply(): void {
    this.request.set({ ...this.form.getRawValue(), page: 1, pageSize: this.request().pageSize });
  }

  protected clear(): void {
    this.form.reset();
    this.apply();
  }

  protected siteNames(lot: LotListItem): string {
    return lot.sites.map((s) => s.name).join(', ');
  }

  protected turnPage(event: PageEvent): void {
    this.request.update((r) => ({ ...r, page: event.pageIndex + 1, pageSize: event.pageSize }));
  }
}
