// Home card for the vaccination crew: today's sheet, the checks still to do and the vials still out.
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatIconModule } from '@angular/material/icon';
import { RouterLink } from '@angular/router';
import { AuthStore } from '../../core/auth/auth-store';
import { DayApi } from '../../shared/vaccination-day/day-api';
import { localDay } from '../../shared/vaccination-day/local-day';

@Component({
  selector: 'vy-crew-card',
  imports: [MatCardModule, MatButtonModule, MatIconModule, RouterLink],
  template: `
    @if (show()) {
      <mat-card appearance="outlined">
        <mat-card-header>
          <mat-icon mat-card-avatar aria-hidden="true">event_available</mat-icon>
          <mat-card-title><h2>Today's vaccinations</h2></mat-card-title>
        </mat-card-header>
        <mat-card-content>
          @if (entries().length === 0) {
            <p>Nothing on your sheet today.</p>
          } @else {
            <p>{{ entries().length }} vaccination{{ entries().length === 1 ? '' : 's' }}, {{ done() }} done.</p>
            <p>{{ checks() }} check{{ checks() === 1 ? '' : 's' }} to do · {{ vialsOut() }} vial{{ vialsOut() === 1 ? '' : 's' }} to return or record.</p>
          }
        </mat-card-content>
        <mat-card-actions>
          <a mat-button routerLink="/vaccination-day">Open the day sheet</a>
        </mat-card-actions>
      </mat-card>
    }
  `,
  styles: `h2 { margin: 0; font: var(--mat-sys-title-medium); }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CrewCard {
  private readonly auth = inject(AuthStore);
  private readonly api = inject(DayApi);
  protected readonly show = computed(() => {
    this.auth.user();
    return this.auth.hasRole('crew');
  });
  private readonly sheet = rxResource({ params: () => (this.show() ? localDay() : undefined), stream: ({ params }) => this.api.sheet(params) });
  protected readonly entries = computed(() => this.sheet.value()?.entries ?? []);
  protected readonly done = computed(() => this.entries().filter((e) => e.status === 'done').length);
  protected readonly checks = computed(() => this.entries().reduce((n, e) => n + (e.status === 'done' ? 0 : e.blockers), 0));
  protected readonly vialsOut = computed(() => this.entries().reduce((n, e) => n + e.vialsOut, 0));
}
