// The signed-in user's notifications and unread count, shared by the toolbar bell and the notifications page.
import { HttpClient } from '@angular/common/http';
import { DestroyRef, Injectable, inject, signal } from '@angular/core';
import { NavigationEnd, Router } from '@angular/router';
import { filter, firstValueFrom } from 'rxjs';
import type { NotificationList, NotificationView } from '@shared/notifications/notification-view.js';
import { handlesOwnErrors } from '../http/error-interceptor';

/** Often enough that a new hold shows within a minute, rarely enough to cost nothing. */
const POLL_MS = 60_000;

@Injectable({ providedIn: 'root' })
export class NotificationsStore {
  private readonly http = inject(HttpClient);
  readonly items = signal<NotificationView[]>([]);
  readonly unread = signal(0);
  readonly loaded = signal(false);

  constructor() {
    const timer = setInterval(() => void this.refresh(), POLL_MS);
    inject(DestroyRef).onDestroy(() => clearInterval(timer));
    // Every page change refreshes the count, so a decision just signed shows at once.
    inject(Router).events.pipe(filter((e) => e instanceof NavigationEnd)).subscribe(() => void this.refresh());
    void this.refresh();
  }

  async refresh(): Promise<void> {
    try {
      const list = await firstValueFrom(this.http.get<NotificationList>('/api/notifications', { context: handlesOwnErrors() }));
      this.items.set(list.items);
      this.unread.set(list.unread);
      this.loaded.set(true);
    } catch {
      // Signed out or offline: the bell keeps its last count.
    }
  }

  async markRead(id: number): Promise<void> {
    const result = await firstValueFrom(this.http.post<{ unread: number }>(`/api/notifications/${id}/read`, {}));
    this.unread.set(result.unread);
    this.items.update((items) => items.map((n) => (n.id === id ? { ...n, readAt: n.readAt ?? new Date().toISOString() } : n)));
  }

  async markAllRead(): Promise<void> {
    await firstValueFrom(this.http.post('/api/notifications/read-all', {}));
    await this.refresh();
  }
}
