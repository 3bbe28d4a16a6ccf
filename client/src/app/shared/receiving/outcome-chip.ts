// A shipment's outcome as a small coloured label, in our status colours.
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { outcomeLabels, type ShipmentOutcome } from '@shared/receiving/arrival-checks.js';

@Component({
  selector: 'vy-outcome-chip',
  template: `<span class="chip" [class]="outcome()">{{ label() }}</span>`,
  styles: `
    .chip { display: inline-block; padding: 2px 10px; border-radius: 12px; font: var(--mat-sys-label-large); }
    .accepted { background: var(--vy-ok-container); color: var(--vy-on-ok-container); }
    .accepted_with_discrepancies { background: var(--vy-warn-container); color: var(--vy-on-warn-container); }
    .refused { background: var(--vy-hold-container); color: var(--vy-on-hold-container); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class OutcomeChip {
  readonly outcome = input.required<ShipmentOutcome>();
  protected readonly label = computed(() => outcomeLabels[this.outcome()]);
}
