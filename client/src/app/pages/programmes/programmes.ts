// Vaccination programmes shared by every site: their steps by age; admins, purchasing and veterinarians keep them.
import { ChangeDetectionStrategy, Component, computed, inject } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatDialog } from '@angular/material/dialog';
import { MatIconModule } from '@angular/material/icon';
import { productRouteLabels } from '@shared/catalogue/product-kinds.js';
import type { ProgrammeView } from '@shared/flocks/programme-schemas.js';
import { AuthStore } from '../../core/auth/auth-store';
import { FlocksApi } from '../../shared/flocks/flocks-api';
import { StatusChip } from '../../shared/flocks/status-chip';
import { ProgrammeDialog } from './programme-dialog';
import { CountPipe } from '../../shared/text/count-pipe';

@Component({
  selector: 'vy-programmes',
  imports: [MatCardModule, MatButtonModule, MatIconModule, StatusChip, CountPipe],
  templateUrl: './programmes.html',
  styleUrl: './programmes.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Programmes {
  private readonly api = inject(FlocksApi);
  private readonly dialog = inject(MatDialog);
  private readonly auth = inject(AuthStore);
  protected readonly programmes = rxResource({ stream: () => this.api.programmes() });
  protected readonly routeLabels = productRouteLabels;
  protected readonly canKeep = computed(() => {
    this.auth.user();
    return this.auth.hasRole('admin', 'purchasing', 'veterinarian');
  });

  protected edit(programme: ProgrammeView | null): void {
    this.dialog.open(ProgrammeDialog, { data: programme, width: '900px', maxWidth: '96vw' }).afterClosed().subscribe((saved) => saved && this.programmes.reload());
  }
}
