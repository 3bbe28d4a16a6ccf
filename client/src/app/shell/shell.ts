// The signed-in layout: a top bar, navigation for the user's roles (a drawer on phones), and the routed page.
import { BreakpointObserver } from '@angular/cdk/layout';
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatListModule } from '@angular/material/list';
import { MatMenuModule } from '@angular/material/menu';
import { MatSidenavModule } from '@angular/material/sidenav';
import { MatToolbarModule } from '@angular/material/toolbar';
import { RouterLink, RouterLinkActive, RouterOutlet } from '@angular/router';
import { map } from 'rxjs';
import { roleLabels } from '@shared/auth/roles.js';
import { AuthStore } from '../core/auth/auth-store';
import { navItems } from './nav-items';
import { NotificationBell } from './notification-bell';

@Component({
  selector: 'vy-shell',
  imports: [MatToolbarModule, MatSidenavModule, MatListModule, MatIconModule, MatButtonModule, MatMenuModule, RouterOutlet, RouterLink, RouterLinkActive, NotificationBell],
  templateUrl: './shell.html',
  styleUrl: './shell.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Shell {
  private readonly auth = inject(AuthStore);
  protected readonly user = this.auth.user;
  protected readonly handset = toSignal(
    inject(BreakpointObserver).observe('(max-width: 840px)').pipe(map((state) => state.matches)),
    { initialValue: false },
  );
  protected readonly items = computed(() => {
    this.user();
    return navItems.filter((item) => !item.roles || this.auth.hasRole(...item.roles));
  });
  protected readonly roleText = computed(() => (this.user()?.roles ?? []).map((role) => roleLabels[role]).join(', '));

  protected signOut(): void {
    void this.auth.signOut();
  }
}
