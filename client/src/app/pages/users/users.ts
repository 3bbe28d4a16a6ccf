// Users administration: a sortable, filterable, paged table and a dialog to create or edit a user (site settings live on the sites page).
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource, toSignal } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatChipsModule } from '@angular/material/chips';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatPaginatorModule, type PageEvent } from '@angular/material/paginator';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSortModule, type Sort } from '@angular/material/sort';
import { MatTableModule } from '@angular/material/table';
import { roleLabels, type Role } from '@shared/auth/roles.js';
import type { UserSummary } from '@shared/users/user-schemas.js';
import { SitesApi } from '../../core/sites/sites-api';
import { UserDialog, type UserDialogData } from './user-dialog';
import { UsersApi, type UserPageQuery } from './users-api';

@Component({
  selector: 'vy-users',
  imports: [MatTableModule, MatSortModule, MatPaginatorModule, MatFormFieldModule, MatInputModule, MatButtonModule, MatIconModule, MatChipsModule, MatProgressBarModule],
  templateUrl: './users.html',
  styleUrl: './users.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Users {
  private readonly api = inject(UsersApi);
  private readonly dialog = inject(MatDialog);
  private readonly sites = toSignal(inject(SitesApi).list(), { initialValue: [] });

  protected readonly columns = ['name', 'email', 'roles', 'sites', 'status', 'actions'];
  protected readonly query = signal<UserPageQuery>({ search: '', sort: 'name', direction: 'asc', page: 0, pageSize: 25 });
  protected readonly users = rxResource({ params: () => this.query(), stream: ({ params }) => this.api.list(params) });
  protected readonly rows = computed(() => this.users.value()?.items ?? []);
  protected readonly total = computed(() => this.users.value()?.total ?? 0);

  private searchTimer: ReturnType<typeof setTimeout> | undefined;

  protected roleLabel(role: Role): string {
    return roleLabels[role];
  }

  protected siteNames(user: UserSummary): string {
    if (user.allSites) return 'All sites';
    return user.siteIds.map((id) => this.sites().find((site) => site.id === id)?.code ?? `#${id}`).join(', ');
  }

  protected filter(text: string): void {
    clearTimeout(this.searchTimer);
    this.searchTimer = setTimeout(() => this.query.update((q) => ({ ...q, search: text, page: 0 })), 250);
  }

  protected sortBy(sort: Sort): void {
    const column = sort.active === 'email' ? 'email' : 'name';
    this.query.update((q) => ({ ...q, sort: column, direction: sort.direction === 'desc' ? 'desc' : 'asc', page: 0 }));
  }

  protected page(event: PageEvent): void {
    this.query.update((q) => ({ ...q, page: event.pageIndex, pageSize: event.pageSize }));
  }

  protected openUser(user: UserSummary | null): void {
    const data: UserDialogData = { user, sites: this.sites() };
    this.dialog
      .open(UserDialog, { data, width: '560px', maxWidth: '95vw', autoFocus: 'first-tabbable' })
      .afterClosed()
      .subscribe((saved) => saved && this.users.reload());
  }
}
