// Flocks of a site with their age, birds, overdue and next vaccination, and the site's houses; keepers place flocks and add houses.
import { ChangeDetectionStrategy, Component, computed, inject, linkedSignal, signal } from '@angular/core';
import { rxResource, toSignal } from '@angular/core/rxjs-interop';
import { DecimalPipe } from '@angular/common';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { MatTableModule } from '@angular/material/table';
import { RouterLink } from '@angular/router';
import { ageLabel } from '@shared/flocks/flock-age.js';
import { flockStatusLabels, type FlockStatus } from '@shared/flocks/flock-status.js';
import type { HouseView } from '@shared/flocks/house-schemas.js';
import { housingLabels } from '@shared/flocks/housings.js';
import { of } from 'rxjs';
import { AuthStore } from '../../core/auth/auth-store';
import { SitesApi } from '../../core/sites/sites-api';
import { FlockDialog, type FlockDialogData } from '../../shared/flocks/flock-dialog';
import { FlocksApi } from '../../shared/flocks/flocks-api';
import { SitePicker } from '../../shared/flocks/site-picker';
import { labelOf } from '../../shared/flocks/label-of';
import { StatusChip, type ChipTone } from '../../shared/flocks/status-chip';
import { HouseDialog, type HouseDialogData } from './house-dialog';

const statusTones: Record<FlockStatus, ChipTone> = { planned: 'neutral', placed: 'ok', depleted: 'neutral' };

@Component({
  selector: 'vy-flocks',
  imports: [MatTableModule, MatButtonModule, MatIconModule, MatSlideToggleModule, MatProgressBarModule, RouterLink, DecimalPipe, SitePicker, StatusChip],
  templateUrl: './flocks.html',
  styleUrl: './flocks.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Flocks {
  private readonly api = inject(FlocksApi);
  private readonly dialog = inject(MatDialog);
  private readonly auth = inject(AuthStore);
  protected readonly sites = toSignal(inject(SitesApi).list(), { initialValue: [] });
  protected readonly siteId = linkedSignal<number | null>(() => this.sites()[0]?.id ?? null);
  protected readonly includeDepleted = signal(false);
  protected readonly canKeep = computed(() => {
    this.auth.user();
    return this.auth.hasRole('admin', 'purchasing', 'veterinarian');
  });
  protected readonly flockColumns = ['name', 'house', 'age', 'birds', 'status', 'programme', 'next'];
  protected readonly houseColumns = computed(() => ['name', 'housing', 'capacity', 'flock', ...(this.canKeep() ? ['actions'] : [])]);
  protected readonly housingLabels = housingLabels;
  protected readonly statusLabels = flockStatusLabels;
  protected readonly statusTones = statusTones;
  protected readonly labelOf = labelOf;
  protected readonly ageLabel = ageLabel;

  protected readonly flocks = rxResource({
    params: () => ({ siteId: this.siteId(), includeDepleted: this.includeDepleted() }),
    stream: ({ params }) => (params.siteId === null ? of([]) : this.api.flocks(params.siteId, params.includeDepleted)),
  });
  protected readonly houses = rxResource({ params: () => this.siteId() ?? undefined, stream: ({ params }) => this.api.houses(params) });
  private readonly programmes = rxResource({ stream: () => this.api.programmes() });

  protected placeFlock(): void {
    const data: FlockDialogData = { houses: this.houses.value() ?? [], programmes: this.programmes.value() ?? [], flock: null };
    this.dialog
      .open(FlockDialog, { data, width: '620px', maxWidth: '95vw' })
      .afterClosed()
      .subscribe((saved) => {
        if (!saved) return;
        this.flocks.reload();
        this.houses.reload();
      });
  }

  protected editHouse(house: HouseView | null): void {
    const siteId = this.siteId();
    if (siteId === null) return;
    const data: HouseDialogData = { siteId, house };
    this.dialog.open(HouseDialog, { data, width: '480px', maxWidth: '95vw' }).afterClosed().subscribe((saved) => saved && this.houses.reload());
  }
}
