// One fridge: its chart, excursions and gaps, upload history, loggers and certificates, checks and monthly record.
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { rxResource, toSignal } from '@angular/core/rxjs-interop';
import { DecimalPipe } from '@angular/common';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatTableModule } from '@angular/material/table';
import { MatSnackBar } from '@angular/material/snack-bar';
import { RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import type { ExcursionView } from '@shared/fridges/excursion-view.js';
import type { LoggerView } from '@shared/fridges/logger-schemas.js';
import { AuthStore } from '../../core/auth/auth-store';
import { ApiError } from '../../core/http/api-error';
import { SitesApi } from '../../core/sites/sites-api';
import { SiteTimePipe } from '../../shared/sites/site-time-pipe';
import { TemperaturePipe } from '../../shared/temperature/temperature-pipe';
import { FridgeDialog, type FridgeDialogData } from '../fridges/fridge-dialog';
import { FridgesApi } from '../fridges/fridges-api';
import { ActionDialog } from './action-dialog';
import { CertificateDialog } from './certificate-dialog';
import { durationText } from './duration-text';
import { FridgeChart } from './fridge-chart';
import { LoggerDialog } from './logger-dialog';
import { CountDueNote } from '../stock-count/count-due-note';

@Component({
  selector: 'vy-fridge',
  imports: [FridgeChart, CountDueNote, MatButtonModule, MatIconModule, MatTableModule, MatProgressBarModule, MatFormFieldModule, MatInputModule, RouterLink, DecimalPipe, SiteTimePipe, TemperaturePipe],
  templateUrl: './fridge.html',
  styleUrl: './fridge.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Fridge {
  /** From the route (`/fridges/:fridgeId`). */
  readonly fridgeId = input.required<string>();
  private readonly api = inject(FridgesApi);
  private readonly dialog = inject(MatDialog);
  private readonly auth = inject(AuthStore);
  private readonly snackBar = inject(MatSnackBar);
  private readonly sites = toSignal(inject(SitesApi).list(), { initialValue: [] });
  protected readonly id = computed(() => Number(this.fridgeId()));
  protected readonly fridge = rxResource({ params: () => this.id(), stream: ({ params }) => this.api.get(params) });
  protected readonly events = rxResource({ params: () => this.id(), stream: ({ params }) => this.api.events(params) });
  protected readonly imports = rxResource({ params: () => this.id(), stream: ({ params }) => this.api.imports(params) });
  protected readonly checks = rxResource({ params: () => this.id(), stream: ({ params }) => this.api.dailyChecks(params) });
  protected readonly excursions = computed(() => this.events.value()?.excursions ?? []);
  protected readonly canChange = computed(() => {
    this.auth.user();
    return this.auth.hasRole('admin', 'storage');
  });
  protected readonly duration = durationText;
  protected readonly month = signal(new Date().toISOString().slice(0, 7));
  protected readonly excursionColumns = ['kind', 'start', 'duration', 'peak', 'status', 'files', 'action'];
  protected readonly gapColumns = ['start', 'end', 'duration'];
  protected readonly importColumns = ['importedAt', 'file', 'logger', 'span', 'counts', 'by'];
  protected readonly checkColumns = ['checkedAt', 'current', 'minmax', 'initials'];

  protected statusLabel(e: ExcursionView): string {
    return { open: 'Open', in_review: 'In review', decided: 'Decided' }[e.status];
  }

  protected editFridge(): void {
    const fridge = this.fridge.value();
    if (!fridge) return;
    const data: FridgeDialogData = { fridge, sites: this.sites() };
    this.dialog.open(FridgeDialog, { data, width: '560px', maxWidth: '95vw' }).afterClosed().subscribe((saved) => saved && this.reloadAll());
  }

  protected addLogger(): void {
    this.dialog.open(LoggerDialog, { data: { fridgeId: this.id() }, width: '480px', maxWidth: '95vw' }).afterClosed().subscribe((saved) => saved && this.fridge.reload());
  }

  protected addCertificate(logger: LoggerView): void {
    this.dialog.open(CertificateDialog, { data: { logger }, width: '480px', maxWidth: '95vw' }).afterClosed().subscribe((saved) => saved && this.fridge.reload());
  }

  /** A retired logger keeps its readings and certificates; a new primary can then be added. */
  protected async retire(logger: LoggerView): Promise<void> {
    if (!confirm(`Retire logger ${logger.serial} today? Its readings and certificates are kept.`)) return;
    const today = new Date();
    const date = `${today.getFullYear()}-${String(today.getMonth() + 1).padStart(2, '0')}-${String(today.getDate()).padStart(2, '0')}`;
    try {
      await firstValueFrom(this.api.updateLogger(logger.id, { removedOn: date }));
      this.fridge.reload();
    } catch (error) {
      this.snackBar.open(ApiError.from(error).message, 'Dismiss', { duration: 8000 });
    }
  }

  protected recordAction(excursion: ExcursionView): void {
    this.dialog.open(ActionDialog, { data: { excursion }, width: '520px', maxWidth: '95vw' }).afterClosed().subscribe((saved) => saved && this.events.reload());
  }

  protected recordUrl(format: 'pdf' | 'csv'): string {
    return `/api/fridges/${this.id()}/record?month=${this.month()}&format=${format}`;
  }

  private reloadAll(): void {
    this.fridge.reload();
    this.events.reload();
  }
}
