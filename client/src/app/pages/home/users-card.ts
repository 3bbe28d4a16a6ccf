// Home card for administrators: how many people can sign in, and a way to manage them.
import { HttpClient } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { map } from 'rxjs';

@Component({
  selector: 'vy-users-card',
  imports: [MatCardModule, MatButtonModule, MatIconModule, RouterLink],
  template: `
    <mat-card appearance="outlined">
      <mat-card-header>
        <mat-icon mat-card-avatar aria-hidden="true">group</mat-icon>
        <mat-card-title><h2>Users</h2></mat-card-title>
      </mat-card-header>
      <mat-card-content>
        <p>{{ total() ?? '…' }} accounts. Give each person only the roles and sites they need.</p>
      </mat-card-content>
      <mat-card-actions>
        <a mat-button routerLink="/users">Manage users</a>
      </mat-card-actions>
    </mat-card>
  `,
  styles: `h2 { margin: 0; font: var(--mat-sys-title-medium); }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class UsersCard {
  protected readonly total = toSignal(
    inject(HttpClient).get<{ total: number }>('/api/users', { params: { pageSize: 1 } }).pipe(map((body) => body.total)),
  );
}
