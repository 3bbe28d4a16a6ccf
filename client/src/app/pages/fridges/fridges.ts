// The fridges list: every visible fridge with what needs attention now, and a dialog to add or change one.
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { rxResource, toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatTableModule } from '@angular/material/table';
import { RouterLink } from '@angular/router';
import type { FridgeStatus } from '@shared/fridges/fridge-schemas.js';
import { AuthStore } from '../../core/auth/auth-store';
import { SitesApi } from '../../core/sites/sites-api';
import { SiteTimePipe } from '../../shared/sites/site-time-pipe';
import { TemperaturePipe } from '../../shared/temperature/temperature-pipe';
import { FridgeDialog, type FridgeDialogData } from './fridge-dialog';
import { LotsApi } from '../../shared/lots/lots-api';
import { FridgesApi } from './fridges-api';

@Component({
  selector: 'vy-fridges',
  imports: [MatTableModule, MatButtonModule, MatIconModule, MatProgressBarModule, RouterLink, SiteTimePipe, TemperaturePipe],
  templateUrl: './fridges.html',
  styleUrl: './fridges.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Fridges {
  private readonly api = inject(FridgesApi);
  private readonly dialog = inject(MatDialog);
  private readonly auth = inject(AuthStore);
  private readonly sites = toSignal(inject(SitesApi).list(), { initialValue: [] });
  /** Fridges whose stock count is due (monthly, and after each delivery), as on the storage home card. */
  private readonly countsDue = toSignal(inject(LotsApi).countsDue(), { initialValue: [] });
  private readonly countDueIds = computed(() => new Set(this.countsDue().map((c) => c.fridgeId)));

  protected readonly fridges = rxResource({ stream: () => this.api.list() });
  protected readonly rows = computed(() => this.fridges.value() ?? []);
  protected readonly columns = ['fridge', 'site', 'range', 'newest', 'attention'];
  protected readonly canChange = computed(() => {
    this.auth.user();
    return this.auth.hasRole('admin', 'storage');
  });

  protected attention(f: FridgeStatus): { text: string; tone: 'warn' | 'hold' }[] {
    return [
      ...(f.noRecentData ? [{ text: 'No recent data', tone: 'warn' as const }] : []),
      ...(f.checksToday < f.checksNeeded ? [{ text: `Checked ${f.checksToday} of ${f.checksNeeded} today`, tone: 'warn' as const }] : []),
      ...(f.openExcursions ? [{ text: `${f.openExcursions} open excursion${f.openExcursions === 1 ? '' : 's'}`, tone: 'hold' as const }] : []),
      ...(f.calibrationsDue ? [{ text: 'Calibration due', tone: 'warn' as const }] : []),
      ...(this.countDueIds().has(f.id) ? [{ text: 'Stock count due', tone: 'warn' as const }] : []),
    ];
  }

  protected openFridge(fridge: FridgeStatus | null): void {
    const data: FridgeDialogData = { fridge, sites: this.sites() };
    this.dialog
      .open(FridgeDialog, { data, width: '560px', maxWidth: '95vw', autoFocus: 'first-tabbable' })
      .afterClosed()
      .subscribe((saved) => saved && this.fridges.reload());
  }
}
