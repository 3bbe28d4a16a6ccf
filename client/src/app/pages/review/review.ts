// The veterinarian's review: every undecided hold grouped by the event behind it, and a signed decision per lot.
import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { AuthStore } from '../../core/auth/auth-store';
import { NotificationsStore } from '../../core/notifications/notifications-store';
import { DecisionDialog } from './decision-dialog';
import { RecallDialog } from './recall-dialog';
import { ReviewEventChart } from './review-event-chart';
import { TroubleshootingDialog, type TroubleshootingDialogData } from './troubleshooting-dialog';
import { SiteTimePipe } from '../../shared/sites/site-time-pipe';
import { formatTemperature, TemperaturePipe } from '../../shared/temperature/temperature-pipe';
import { ReviewApi, type QueueEvent, type QueueLot } from './review-api';

const causeLabels: Record<string, string> = {
  arrival: 'Arrived outside its range',
  excursion: 'Fridge excursion',
  freeze: 'Possible freezing',
  transfer: 'Too long out of a fridge',
  return: 'Returned from a vaccination',
  recall: 'Recall',
};

@Component({
  selector: 'vy-review',
  imports: [MatCardModule, MatButtonModule, MatIconModule, DecimalPipe, RouterLink, SiteTimePipe, TemperaturePipe, ReviewEventChart],
  templateUrl: './review.html',
  styleUrl: './review.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Review {
  private readonly api = inject(ReviewApi);
  private readonly dialog = inject(MatDialog);
  private readonly auth = inject(AuthStore);
  private readonly notifications = inject(NotificationsStore);
  protected readonly queue = rxResource({ stream: () => this.api.queue() });
  // Possible freezing first: it is the severe kind.
  protected readonly events = computed(() => [...(this.queue.value() ?? [])].sort((a, b) => Number(b.severe) - Number(a.severe)));
  protected readonly canDecide = computed(() => {
    this.auth.user();
    return this.auth.hasRole('veterinarian');
  });

  /** Storage staff (and admins) fill the troubleshooting record; the veterinarian reads it. */
  protected readonly canFill = computed(() => {
    this.auth.user();
    return this.auth.hasRole('storage', 'admin');
  });

  protected causeLabel(event: QueueEvent): string {
    return causeLabels[event.cause] ?? event.cause;
  }

  /** The cause, and for a fridge event or a recall what it was (which fridge, which range; which lot number). */
  protected heading(event: QueueEvent): string {
    if (event.recall) return event.title;
    const x = event.exposureEvent;
    if (!x) return this.causeLabel(event);
    // Built here rather than taken from the server's title, so the range is in the user's unit like the figures.
    const unit = this.auth.displayUnit();
    const where = x.source === 'daily_check' ? `${x.fridgeName}, daily check` : x.fridgeName;
    const what = x.cause === 'freeze'
      ? `at or below ${formatTemperature(0, unit)}`
      : `${x.kind === 'high' ? 'above' : 'below'} the product range ${formatTemperature(x.lowC, unit)} to ${formatTemperature(x.highC, unit)}`;
    return `${this.causeLabel(event)} · ${where}: ${what}${x.fridgeAlarmed ? '' : ' (no fridge alarm)'}`;
  }

  /** Degrees beyond the limit × minutes, in the user's unit: a temperature difference, so °F is × 1.8 with no 32 added. */
  protected degreeMinutes(valueC: number | null): string {
    if (valueC === null) return '—';
    const unit = this.auth.displayUnit();
    const value = unit === 'F' ? valueC * 1.8 : valueC;
    return `${value.toLocaleString(undefined, { minimumFractionDigits: 1, maximumFractionDigits: 1 })} °${unit}·min`;
  }

  protected reportUrl(eventId: number): string {
    return `/api/holds/events/${eventId}/report.pdf`;
  }

  protected fill(event: QueueEvent): void {
    if (!event.exposureEvent) return;
    const data: TroubleshootingDialogData = { eventId: event.exposureEvent.id, title: event.title, record: event.troubleshooting, unit: this.auth.displayUnit(), timeZone: event.timeZone };
    this.dialog
      .open(TroubleshootingDialog, { data, width: '720px', maxWidth: '95vw' })
      .afterClosed()
      .subscribe((saved) => saved && this.queue.reload());
  }

  protected placeRecall(): void {
    this.dialog
      .open(RecallDialog, { width: '520px', maxWidth: '95vw' })
      .afterClosed()
      .subscribe((placed) => placed && this.changed());
  }

  /** A decision or a recall notifies people, the signer included: the queue and the bell both refresh. */
  private changed(): void {
    this.queue.reload();
    void this.notifications.refresh();
  }

  protected decide(lot: QueueLot): void {
    this.dialog
      .open(DecisionDialog, { data: lot, width: '560px', maxWidth: '95vw' })
      .afterClosed()
      .subscribe((signed) => signed && this.changed());
  }
}
