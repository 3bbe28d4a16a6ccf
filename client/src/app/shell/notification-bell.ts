// The toolbar's bell: the unread count at a glance (and in its accessible name), a link to the notifications page.
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { NotificationsStore } from '../core/notifications/notifications-store';

@Component({
  selector: 'vy-notification-bell',
  imports: [MatButtonModule, MatIconModule, RouterLink],
  template: `
    <a mat-icon-button routerLink="/notifications" class="bell" [attr.aria-label]="label()">
      <mat-icon aria-hidden="true">{{ unread() ? 'notifications_active' : 'notifications' }}</mat-icon>
      @if (unread()) {
        <span class="count" aria-hidden="true">{{ unread() > 99 ? '99+' : unread() }}</span>
      }
    </a>
  `,
  styles: `
    .bell { position: relative; color: inherit; --mat-icon-button-icon-color: currentColor; }
    .count {
      position: absolute; top: 2px; right: 0; min-width: 18px; height: 18px; padding: 0 4px; box-sizing: border-box;
      border-radius: 9px; background: var(--mat-sys-error); color: var(--mat-sys-on-error);
      font: var(--mat-sys-label-small); line-height: 18px; text-align: center;
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NotificationBell {
  private readonly store = inject(NotificationsStore);
  protected readonly unread = this.store.unread;
  protected readonly label = computed(() => {
    const n = this.unread();
    return n === 0 ? 'Notifications, none unread' : `Notifications, ${n} unread`;
  });
}
