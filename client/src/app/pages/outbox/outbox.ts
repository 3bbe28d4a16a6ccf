// Admins' outbox: every message the local fake mail server caught, with its text and attachments.
import { HttpClient } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { DecimalPipe } from '@angular/common';
import { MatButtonModule } from '@angular/material/button';
import { MatExpansionModule } from '@angular/material/expansion';
import { MatIconModule } from '@angular/material/icon';
import { map } from 'rxjs';
import { SiteTimePipe } from '../../shared/sites/site-time-pipe';

interface OutboxMessage {
  id: string;
  date: string | null;
  from: string;
  to: string;
  subject: string;
  text: string;
  attachments: { filename: string; contentType: string; size: number }[];
}

@Component({
  selector: 'vy-outbox',
  imports: [MatExpansionModule, MatButtonModule, MatIconModule, SiteTimePipe, DecimalPipe],
  templateUrl: './outbox.html',
  styleUrl: './outbox.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Outbox {
  private readonly http = inject(HttpClient);
  protected readonly refreshed = signal(0);
  protected readonly messages = rxResource({
    params: () => this.refreshed(),
    stream: () => this.http.get<{ items: OutboxMessage[] }>('/api/outbox').pipe(map((body) => body.items)),
  });

  protected attachmentUrl(message: OutboxMessage, index: number): string {
    return `/api/outbox/${encodeURIComponent(message.id)}/attachments/${index}`;
  }
}
