// Home card: the sites the user belongs to, with each site's local time (sites may lie in different zones).
import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIconModule } from '@angular/material/icon';
import { MatListModule } from '@angular/material/list';
import { RouterLink } from '@angular/router';
import { map } from 'rxjs';
import { AuthStore } from '../../core/auth/auth-store';
import { SitesApi } from '../../core/sites/sites-api';

@Component({
  selector: 'vy-sites-card',
  imports: [MatCardModule, MatListModule, MatIconModule, MatButtonModule, RouterLink],
  template: `
    <mat-card appearance="outlined">
      <mat-card-header>
        <mat-icon mat-card-avatar aria-hidden="true">agriculture</mat-icon>
        <mat-card-title><h2>Your sites</h2></mat-card-title>
      </mat-card-header>
      <mat-card-content>
        @if (sites(); as list) {
          @if (list.length) {
            <mat-list>
              @for (site of list; track site.id) {
                <mat-list-item>
                  <span matListItemTitle>{{ site.name }} ({{ site.code }})</span>
                  <span matListItemLine>{{ site.timeZone }} · local time {{ site.localTime }}</span>
                </mat-list-item>
              }
            </mat-list>
          } @else {
            <p>You are not assigned to any site yet. Ask an administrator.</p>
          }
        } @else {
          <p>Loading…</p>
        }
      </mat-card-content>
      @if (isAdmin) {
        <mat-card-actions>
          <a mat-button routerLink="/sites">Site settings</a>
        </mat-card-actions>
      }
    </mat-card>
  `,
  styles: `h2 { margin: 0; font: var(--mat-sys-title-medium); }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SitesCard {
  protected readonly isAdmin = inject(AuthStore).hasRole('admin');
  protected readonly sites = toSignal(
    inject(SitesApi)
      .list()
      .pipe(
        map((sites) =>
          sites.map((site) => ({
            ...site,
            localTime: new Intl.DateTimeFormat(undefined, { timeZone: site.timeZone, hour: '2-digit', minute: '2-digit', timeZoneName: 'short' }).format(new Date()),
          })),
        ),
      ),
  );
}
