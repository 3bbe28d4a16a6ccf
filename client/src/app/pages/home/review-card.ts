// Home card for veterinarians: how many held lots wait for a decision, by event.
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { AuthStore } from '../../core/auth/auth-store';
import { ReviewApi } from '../review/review-api';

@Component({
  selector: 'vy-review-card',
  imports: [MatCardModule, MatButtonModule, MatIconModule, RouterLink],
  template: `
    @if (show()) {
      <mat-card appearance="outlined">
        <mat-card-header>
          <mat-icon mat-card-avatar aria-hidden="true">fact_check</mat-icon>
          <mat-card-title><h2>Waiting for your decision</h2></mat-card-title>
        </mat-card-header>
        <mat-card-content>
          @if (lots() === 0) {
            <p>No held lot is waiting.</p>
          } @else {
            <p>{{ lots() }} held lot{{ lots() === 1 ? '' : 's' }} from {{ events() }} event{{ events() === 1 ? '' : 's' }}, {{ vials() }} vials in all.</p>
          }
        </mat-card-content>
        <mat-card-actions>
          <a mat-button routerLink="/review">Open the review</a>
        </mat-card-actions>
      </mat-card>
    }
  `,
  styles: `h2 { margin: 0; font: var(--mat-sys-title-medium); }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReviewCard {
  private readonly auth = inject(AuthStore);
  private readonly api = inject(ReviewApi);
  protected readonly show = computed(() => {
    this.auth.user();
    return this.auth.hasRole('veterinarian');
  });
  private readonly queue = rxResource({ params: () => this.show() || undefined, stream: () => this.api.queue() });
  protected readonly events = computed(() => this.queue.value()?.length ?? 0);
  protected readonly lots = computed(() => (this.queue.value() ?? []).reduce((n, e) => n + e.lots.length, 0));
  protected readonly vials = computed(() => (this.queue.value() ?? []).reduce((n, e) => n + e.vials, 0));
}
