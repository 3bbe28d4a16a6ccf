// One lot: its status and holds (with the do-not-use tag), where its vials are and have been, exposure, flocks.
import { ChangeDetectionStrategy, Component, computed, inject, input } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { DecimalPipe } from '@angular/common';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { RouterLink } from '@angular/router';
import { holdCauseLabels } from '@shared/lots/hold-causes.js';
import { holdDecisionLabels } from '@shared/lots/lot-status.js';
import type { LotPage, LotPagePlannedTransfer } from '@shared/lots/lot-page.js';
import { AuthStore } from '../../core/auth/auth-store';
import { LotStatusChip } from '../../shared/lots/lot-status-chip';
import { LotsApi, type TransferResult } from '../../shared/lots/lots-api';
import { SiteTimePipe } from '../../shared/sites/site-time-pipe';
import { TemperaturePipe } from '../../shared/temperature/temperature-pipe';
import { DiscardDialog, type DiscardDialogData } from './discard-dialog';
import { LotHistory } from './lot-history';
import { TransferDialog, type TransferDialogData } from './transfer-dialog';

@Component({
  selector: 'vy-lot',
  imports: [MatButtonModule, MatIconModule, MatProgressBarModule, RouterLink, DecimalPipe, SiteTimePipe, TemperaturePipe, LotStatusChip, LotHistory],
  templateUrl: './lot.html',
  styleUrl: './lot.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LotDetail {
  /** From the route (`/lots/:lotId`). */
  readonly lotId = input.required<string>();
  private readonly api = inject(LotsApi);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);
  private readonly auth = inject(AuthStore);
  protected readonly id = computed(() => Number(this.lotId()));
  protected readonly lot = rxResource({ params: () => this.id(), stream: ({ params }) => this.api.get(params) });
  private readonly filters = rxResource({ stream: () => this.api.filters() });
  protected readonly causeLabels = holdCauseLabels;
  protected readonly decisionLabels = holdDecisionLabels;
  protected readonly canMove = computed(() => {
    this.auth.user();
    return this.auth.hasRole('admin', 'storage');
  });
  /** Fridge pages are for api/fridges/fridge-access.ts `fridgeReaders`: the others see a fridge's code, not a link home. */
  protected readonly canReadFridges = computed(() => {
    this.auth.user();
    return this.auth.hasRole('admin', 'storage', 'veterinarian');
  });
  /** The review page's readers (its nav entry's roles) get a way from a waiting hold to the decision. */
  protected readonly canReview = computed(() => {
    this.auth.user();
    return this.auth.hasRole('veterinarian', 'storage', 'admin');
  });
  protected readonly standingCauses = computed(() => [...new Set((this.lot.value()?.holds ?? []).filter((h) => h.standing).map((h) => h.cause))]);
  protected readonly doses = computed(() => {
    const lot = this.lot.value();
    return lot ? lot.vialsOnHand * lot.presentation.dosesPerVial : 0;
  });

  protected hours(minutes: number): string {
    return minutes < 60 ? `${Math.round(minutes)} min` : `${(minutes / 60).toFixed(1)} h`;
  }

  protected overLimit(exposure: LotPage['exposure']): number {
    return exposure.timeOut.filter((t) => t.overLimit).length;
  }

  protected transfer(lot: LotPage, planned?: LotPagePlannedTransfer): void {
    const data: TransferDialogData = { lot, fridges: this.filters.value()?.fridges ?? [], planned };
    this.dialog
      .open(TransferDialog, { data, width: '560px', maxWidth: '95vw' })
      .afterClosed()
      .subscribe((result?: TransferResult) => {
        if (!result) return;
        const out = `${Math.ceil(result.timeOutMinutes)} min out of a fridge`;
        this.snackBar.open(result.holdOpened ? `Moved. ${out}: the lot is now on hold for the veterinarian.` : `Moved. ${out}.`, 'Dismiss', { duration: 8000 });
        this.lot.reload();
      });
  }

  protected discard(lot: LotPage): void {
    const data: DiscardDialogData = { lot };
    this.dialog.open(DiscardDialog, { data, width: '520px', maxWidth: '95vw' }).afterClosed().subscribe((done) => done && this.lot.reload());
  }
}
