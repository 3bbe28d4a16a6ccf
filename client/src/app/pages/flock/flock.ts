// One flock: its dates, age and birds, the bird-number history, and its vaccination schedule: every programme step with its
// state (an overdue one stands out, to plan again or cancel), the withdrawal flag and overrides.
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
import type { ScheduleEntry } from '@shared/flocks/flock-schedule.js';
import { scheduleStateLabels, type ScheduleState } from '@shared/flocks/schedule-states.js';
import type { VaccinationView } from '@shared/flocks/vaccination-schemas.js';
import { AuthStore } from '../../core/auth/auth-store';
import { FlockDialog, type FlockDialogData } from '../../shared/flocks/flock-dialog';
import { FlocksApi } from '../../shared/flocks/flocks-api';
import { labelOf } from '../../shared/flocks/label-of';
import { StatusChip, type ChipTone } from '../../shared/flocks/status-chip';
import { BirdCountDialog } from './bird-count-dialog';
import { DepletionDialog } from './depletion-dialog';
import { ReasonDialog, type ReasonDialogData } from './reason-dialog';
import { VaccinationDialog, type VaccinationDialogData } from './vaccination-dialog';

type Entry = ScheduleEntry<VaccinationView>;

// Overdue and missed share the hold colour of the withdrawal flag: both need the veterinarian's eye.
const stateTones: Record<ScheduleState, ChipTone> = {
  planned: 'neutral',
  confirmed: 'ok',
  overdue: 'hold',
  done: 'ok',
  cancelled: 'neutral',
  missed: 'hold',
  before_placement: 'neutral',
  after_depletion: 'neutral',
};

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
  protected readonly overdue = computed(() => (this.flock.value()?.schedule ?? []).filter((e) => e.state === 'overdue'));
  protected readonly overrides = computed(() =>
    (this.flock.value()?.vaccinations ?? []).flatMap((v) => v.overrides.map((o) => ({ ...o, productName: v.productName }))),
  );
  // The state right after the date, so a phone shows it without scrolling the table sideways.
  protected readonly vaccinationColumns = computed(() => ['date', 'state', 'step', 'product', 'age', 'route', 'withdrawal', ...(this.canKeep() ? ['actions'] : [])]);
  protected readonly countColumns = ['date', 'kind', 'birds', 'after', 'note', 'by'];
  protected readonly ageLabel = ageLabel;
  protected readonly routeLabels = productRouteLabels;
  protected readonly stateLabels = scheduleStateLabels;
  protected readonly stateTones = stateTones;
  protected readonly labelOf = labelOf;
  protected readonly flockStatusLabels = flockStatusLabels;
  protected readonly kindLabels = birdCountKindLabels;
  protected readonly trackEntry = (_: number, entry: Entry) => entry.key;

  /** Still to be given: the withdrawal flag matters only for these. */
  protected isOpen(entry: Entry): boolean {
    return entry.state === 'planned' || entry.state === 'confirmed' || entry.state === 'overdue';
  }

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
    const data: VaccinationDialogData = { flockId: this.flockId(), vaccination, overdue: null };
    this.dialog.open(VaccinationDialog, { data, width: '520px', maxWidth: '95vw' }).afterClosed().subscribe((saved) => saved && this.flock.reload());
  }

  /** An overdue vaccination planned again: the dialog starts on the site's today, the earliest day it may have. */
  protected reschedule(entry: Entry): void {
    const flock = this.flock.value();
    if (!flock || !entry.vaccination) return;
    const data: VaccinationDialogData = {
      flockId: this.flockId(),
      vaccination: entry.vaccination,
      overdue: { stepLabel: entry.step?.label ?? null, daysLate: entry.daysLate, today: flock.today },
    };
    this.dialog.open(VaccinationDialog, { data, width: '520px', maxWidth: '95vw' }).afterClosed().subscribe((saved) => {
      if (!saved) return;
      this.snackBar.open(`${entry.productName} planned again.`, undefined, { duration: 4000 });
      this.flock.reload();
    });
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
    const flock = this.flock.value();
    const overdue = flock !== undefined && vaccination.plannedDate < flock.today;
    const data: ReasonDialogData = {
      title: `Cancel ${vaccination.productName} ${overdue ? 'due' : 'on'} ${vaccination.plannedDate}`,
      intro:
        'A cancelled vaccination stays on the flock’s schedule with its reason; the programme does not bring it back.' +
        (overdue ? ' Say what happened: for example, given before the flock came to Vialyard, or left out on the veterinarian’s advice.' : ''),
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
