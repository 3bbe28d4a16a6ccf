// Home card for receiving clerks (and admins): shipments due today and overdue, and a way to receive one.
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { EMPTY } from 'rxjs';
import { AuthStore } from '../../core/auth/auth-store';
import { ReceivingApi } from '../../shared/receiving/receiving-api';

@Component({
  selector: 'vy-receiving-card',
  imports: [MatCardModule, MatButtonModule, MatIconModule, RouterLink],
  template: `
    @if (visible()) {
      <mat-card appearance="outlined">
        <mat-card-header>
          <mat-icon mat-card-avatar aria-hidden="true">local_shipping</mat-icon>
          <mat-card-title><h2>Receiving</h2></mat-card-title>
        </mat-card-header>
        <mat-card-content>
          @if (expected(); as list) {
            <p>{{ dueToday() }} due today · {{ overdue() }} overdue.</p>
          } @else {
            <p>Loading…</p>
          }
        </mat-card-content>
        <mat-card-actions>
          <a mat-flat-button routerLink="/receiving">Open receiving</a>
        </mat-card-actions>
      </mat-card>
    }
  `,
  styles: `h2 { margin: 0; font: var(--mat-sys-title-medium); }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReceivingCard {
  private readonly auth = inject(AuthStore);
  protected readonly visible = computed(() => {
    this.auth.user();
    return this.auth.hasRole('admin', 'receiving');
  });
  protected readonly expected = toSignal(this.auth.hasRole('admin', 'receiving') ? inject(ReceivingApi).expected() : EMPTY);
  protected readonly dueToday = computed(() => (this.expected() ?? []).filter((o) => o.due === 'today').length);
  protected readonly overdue = computed(() => (this.expected() ?? []).filter((o) => o.due === 'overdue').length);
}
