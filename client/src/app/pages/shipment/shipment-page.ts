// One received shipment: its checks, lots (with any hold), photos, findings, and the discrepancy report.
import { ChangeDetectionStrategy, Component, computed, inject, input, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';
import { MatSnackBar } from '@angular/material/snack-bar';
import { RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { indicatorLabels, readingPlaceLabels } from '@shared/receiving/arrival-checks.js';
import type { ShipmentView } from '@shared/receiving/shipment-view.js';
import { AuthStore } from '../../core/auth/auth-store';
import { HoldNotice } from '../../shared/receiving/hold-notice';
import { OutcomeChip } from '../../shared/receiving/outcome-chip';
import { ReceivingApi } from '../../shared/receiving/receiving-api';
import { SiteTimePipe } from '../../shared/sites/site-time-pipe';
import { TemperaturePipe } from '../../shared/temperature/temperature-pipe';

@Component({
  selector: 'vy-shipment-page',
  imports: [MatButtonModule, MatIconModule, RouterLink, OutcomeChip, HoldNotice, SiteTimePipe, TemperaturePipe],
  templateUrl: './shipment-page.html',
  styleUrl: './shipment-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ShipmentPage {
  readonly shipmentId = input.required<string>();
  private readonly api = inject(ReceivingApi);
  private readonly auth = inject(AuthStore);
  private readonly snackBar = inject(MatSnackBar);
  protected readonly indicatorLabels = indicatorLabels;
  protected readonly readingPlaceLabels = readingPlaceLabels;
  protected readonly busy = signal(false);
  private readonly replaced = signal<ShipmentView | null>(null);

  protected readonly loaded = rxResource({ params: () => Number(this.shipmentId()), stream: ({ params }) => this.api.shipment(params) });
  protected readonly shipment = computed(() => this.replaced() ?? this.loaded.value());
  protected readonly canReceive = computed(() => {
    this.auth.user();
    return this.auth.hasRole('admin', 'receiving');
  });
  protected readonly checks = computed(() => {
    const s = this.shipment();
    if (!s) return [];
    const yes = (v: boolean) => (v ? 'Yes' : 'No');
    return [
      { label: 'Outer container intact', answer: yes(s.checks.containerIntact), problem: !s.checks.containerIntact },
      { label: 'Coolant present', answer: yes(s.checks.coolantPresent), problem: !s.checks.coolantPresent },
      { label: 'Temperature indicator', answer: indicatorLabels[s.checks.indicator], problem: s.checks.indicator === 'triggered' },
      { label: 'Contents cold', answer: yes(s.checks.contentsCold), problem: !s.checks.contentsCold },
    ];
  });

  protected async mailAgain(id: number): Promise<void> {
    this.busy.set(true);
    try {
      this.replaced.set(await firstValueFrom(this.api.mailReport(id)));
      this.snackBar.open('The report was mailed again.', undefined, { duration: 4000 });
    } finally {
      this.busy.set(false);
    }
  }

  protected async addPhotos(id: number, event: Event): Promise<void> {
    const element = event.target as HTMLInputElement;
    const files = [...(element.files ?? [])];
    element.value = '';
    if (!files.length) return;
    this.busy.set(true);
    try {
      this.replaced.set(await firstValueFrom(this.api.addPhotos(id, files)));
    } finally {
      this.busy.set(false);
    }
  }
}
