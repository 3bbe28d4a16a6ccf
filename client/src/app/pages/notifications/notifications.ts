// The user's notifications, newest first: what was held or decided, with a way to open it and mark it read.
// Times are the reader's own clock (named): a notification is a message to them, and its event's lots may lie on several sites.
import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIconModule } from '@angular/material/icon';
import { Router } from '@angular/router';
import type { NotificationView } from '@shared/notifications/notification-view.js';
import { NotificationsStore } from '../../core/notifications/notifications-store';
import { SiteTimePipe } from '../../shared/sites/site-time-pipe';

@Component({
  selector: 'vy-notifications',
  imports: [MatButtonModule, MatCardModule, MatIconModule, SiteTimePipe],
  templateUrl: './notifications.html',
  styleUrl: './notifications.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Notifications {
  protected readonly store = inject(NotificationsStore);
  private readonly router = inject(Router);

  protected async open(notification: NotificationView): Promise<void> {
    if (!notification.readAt) await this.store.markRead(notification.id);
    if (notification.link) await this.router.navigateByUrl(notification.link);
  }

  protected markRead(notification: NotificationView): void {
    void this.store.markRead(notification.id);
  }

  protected markAllRead(): void {
    void this.store.markAllRead();
  }
}
