// One flock: its dates, age and birds, the bird-number history, and its vaccinations with the withdrawal flag and overrides.
import { DecimalPipe, DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, numberAttribute } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { MatMenuModule } from '@angular/material/menu';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { MatTableModule } from '@angular/material/table';
import { RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { productRouteLabels } from '@shared/catalogue/product-kinds.js';
import { birdCountKindLabels } from '@shared/flocks/bird-count-kinds.js';
import { ageLabel } from '@shared/flocks/flock-age.js';
import { flockStatusLabels } from '@shared/flocks/flock-status.js';
import type { VaccinationView } from '@shared/flocks/vaccination-schemas.js';
import { vaccinationStatusLabels, type VaccinationStatus } from '@shared/flocks/vaccination-statuses.js';
import { AuthStore } from '../../core/auth/auth-store';
import { FlockDialog, type FlockDialogData } from '../../shared/flocks/flock-dialog';
import { FlocksApi } from '../../shared/flocks/flocks-api';
import { labelOf } from '../../shared/flocks/label-of';
import { StatusChip, type ChipTone } from '../../shared/flocks/status-chip';
import { BirdCountDialog } from './bird-count-dialog';
import { DepletionDialog } from './depletion-dialog';
import { ReasonDialog, type ReasonDialogData } from './reason-dialog';
import { VaccinationDialog, type VaccinationDialogData } from './vaccination-dialog';

const statusTones: Record<VaccinationStatus, ChipTone> = { planned: 'neutral', confirmed: 'ok', done: 'ok', cancelled: 'neutral' };

@Component({
  selector: 'vy-flock',
  imports: [MatTableModule, MatButtonModule, MatIconModule, MatMenuModule, MatProgressBarModule, RouterLink, DecimalPipe, DatePipe, StatusChip],
  templateUrl: './flock.html',
  styleUrl: './flock.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Flock {
  readonly flockId = input.required({ transform: numberAttribute });
  private readonly api = inject(FlocksApi);
  private readonly dialog = inject(MatDialog);
  private readonly snackBar = inject(MatSnackBar);
  private readonly auth = inject(AuthStore);

  protected readonly flock = rxResource({ params: () => this.flockId(), stream: ({ params }) => this.api.flock(params) });
  protected readonly canKeep = computed(() => {
    this.auth.user();
    return this.auth.hasRole('admin', 'purchasing', 'veterinarian') && !this.flock.value()?.depletedOn;
  });
  /** The signed vaccination records as files, for the roles the API lets read them (api/vaccination-day/day-roles.ts). */
  protected readonly readsHistory = computed(() => {
    this.auth.user();
    return this.auth.hasRole('admin', 'purchasing', 'veterinarian', 'crew');
  });
  protected historyUrl(format: 'csv' | 'pdf'): string {
    return `/api/vaccination-day/flocks/${this.flockId()}/history.${format}`;
  }
  protected readonly isVeterinarian = computed(() => {
    this.auth.user();
    return this.auth.hasRole('veterinarian');
  });
  protected readonly open = computed(() => (this.flock.value()?.vaccinations ?? []).filter((v) => v.status !== 'cancelled'));
  protected readonly cancelled = computed(() => (this.flock.value()?.vaccinations ?? []).filter((v) => v.status === 'cancelled'));
  protected readonly overrides = computed(() =>
    (this.flock.value()?.vaccinations ?? []).flatMap((v) => v.overrides.map((o) => ({ ...o, productName: v.productName }))),
  );
  protected readonly vaccinationColumns = computed(() => ['date', 'age', 'product', 'route', 'status', 'withdrawal', ...(this.canKeep() ? ['actions'] : [])]);
  protected readonly countColumns = ['date', 'kind', 'birds', 'after', 'note', 'by'];
  protected readonly ageLabel = ageLabel;
  protected readonly routeLabels = productRouteLabels;
  protected readonly statusLabels = vaccinationStatusLabels;
  protected readonly statusTones = statusTones;
  protected readonly labelOf = labelOf;
  protected readonly flockStatusLabels = flockStatusLabels;
  protected readonly kindLabels = birdCountKindLabels;

  protected async editFlock(): Promise<void> {
    const flock = this.flock.value();
    if (!flock) return;
    const [houses, programmes] = await Promise.all([firstValueFrom(this.api.houses(flock.siteId)), firstValueFrom(this.api.programmes())]);
    const data: FlockDialogData = { houses, programmes, flock };
    this.dialog.open(FlockDialog, { data, width: '620px', maxWidth: '95vw' }).afterClosed().subscribe((saved) => saved && this.flock.reload());
  }

  protected recordBirds(): void {
    this.dialog.open(BirdCountDialog, { data: this.flock.value(), width: '480px', maxWidth: '95vw' }).afterClosed().subscribe((saved) => saved && this.flock.reload());
  }

  protected recordDepletion(): void {
    this.dialog.open(DepletionDialog, { data: this.flock.value(), width: '440px', maxWidth: '95vw' }).afterClosed().subscribe((saved) => saved && this.flock.reload());
  }

  protected editVaccination(vaccination: VaccinationView | null): void {
    const data: VaccinationDialogData = { flockId: this.flockId(), vaccination };
    this.dialog.open(VaccinationDialog, { data, width: '520px', maxWidth: '95vw' }).afterClosed().subscribe((saved) => saved && this.flock.reload());
  }

  protected async confirm(vaccination: VaccinationView): Promise<void> {
    try {
      await firstValueFrom(this.api.confirmVaccination(vaccination.id));
      this.snackBar.open(`${vaccination.productName} on ${vaccination.plannedDate} confirmed.`, undefined, { duration: 4000 });
    } finally {
      this.flock.reload();
    }
  }

  protected cancel(vaccination: VaccinationView): void {
    const data: ReasonDialogData = {
      title: `Cancel ${vaccination.productName} on ${vaccination.plannedDate}`,
      intro: 'A cancelled vaccination stays in the flock’s record with its reason; the programme does not bring it back.',
      label: 'Reason',
      minLength: 1,
      action: 'Cancel vaccination',
      send: (reason) => this.api.cancelVaccination(vaccination.id, reason),
    };
    this.dialog.open(ReasonDialog, { data, width: '520px', maxWidth: '95vw' }).afterClosed().subscribe((saved) => saved && this.flock.reload());
  }

  protected override(vaccination: VaccinationView): void {
    const w = vaccination.withdrawal;
    const data: ReasonDialogData = {
      title: 'Override the withdrawal flag',
      intro:
        `${vaccination.productName} is planned ${w.daysBeforeDepletion} days before the flock’s depletion; its label asks for ${w.withdrawalDays} days. ` +
        'Your override, with your name and reason, covers this date and this depletion only. Follow the product label and local rules.',
      label: 'Reason for the override',
      minLength: 10,
      action: 'Override',
      send: (reason) => this.api.overrideWithdrawal(vaccination.id, reason),
    };
    this.dialog.open(ReasonDialog, { data, width: '560px', maxWidth: '95vw' }).afterClosed().subscribe((saved) => saved && this.flock.reload());
  }
}
