// The veterinarian's review: every undecided hold grouped by the event behind it, and a signed decision per lot.
import { DatePipe, DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { AuthStore } from '../../core/auth/auth-store';
import { DecisionDialog } from './decision-dialog';
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
  imports: [MatCardModule, MatButtonModule, MatIconModule, DatePipe, DecimalPipe],
  templateUrl: './review.html',
  styleUrl: './review.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Review {
  private readonly api = inject(ReviewApi);
  private readonly dialog = inject(MatDialog);
  private readonly auth = inject(AuthStore);
  protected readonly queue = rxResource({ stream: () => this.api.queue() });
  protected readonly events = computed(() => this.queue.value() ?? []);
  protected readonly canDecide = computed(() => {
    this.auth.user();
    return this.auth.hasRole('veterinarian');
  });

  protected causeLabel(event: QueueEvent): string {
    return causeLabels[event.cause] ?? event.cause;
  }

  protected decide(lot: QueueLot): void {
    this.dialog
      .open(DecisionDialog, { data: lot, width: '560px', maxWidth: '95vw' })
      .afterClosed()
      .subscribe((signed) => signed && this.queue.reload());
  }
}
