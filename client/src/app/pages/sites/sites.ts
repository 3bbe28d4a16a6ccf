// Sites administration: every site with its settings in short, and one dialog to create a site or change any of its settings.
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatTableModule } from '@angular/material/table';
import type { SiteSettings, SiteView } from '@shared/sites/site-schemas.js';
import { SitesApi } from '../../core/sites/sites-api';
import { TemperaturePipe } from '../../shared/temperature/temperature-pipe';
import { SiteDialog } from './site-dialog';

@Component({
  selector: 'vy-sites',
  imports: [MatTableModule, MatButtonModule, MatIconModule, MatProgressBarModule, TemperaturePipe],
  templateUrl: './sites.html',
  styleUrl: './sites.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Sites {
  private readonly api = inject(SitesApi);
  private readonly dialog = inject(MatDialog);

  protected readonly sites = rxResource({ stream: () => this.api.list() });
  protected readonly rows = computed(() => this.sites.value() ?? []);
  protected readonly columns = ['code', 'name', 'timeZone', 'receiving', 'storage', 'purchasing', 'vaccinationDay', 'actions'];

  /** Purchasing's four settings, one short line each. */
  protected purchasing(settings: SiteSettings): string[] {
    return [
      `Plans ${settings.projectionHorizonDays} days ahead`,
      `${settings.overagePercent} % extra doses`,
      `Expiry alerts at ${settings.expiryAlertDays.join(', ')} days`,
      `Reorder margin ${settings.reorderMarginDays} ${settings.reorderMarginDays === 1 ? 'day' : 'days'}`,
    ];
  }

  protected openSite(site: SiteView | null): void {
    this.dialog
      .open(SiteDialog, { data: site, width: '680px', maxWidth: '95vw', autoFocus: 'first-tabbable' })
      .afterClosed()
      .subscribe((saved) => saved && this.sites.reload());
  }
}
