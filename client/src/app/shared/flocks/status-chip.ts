// A small coloured label for a state (planned, confirmed, flagged, short...), in our status colours with readable contrast.
import { ChangeDetectionStrategy, Component, input } from '@angular/core';

export type ChipTone = 'ok' | 'warn' | 'hold' | 'neutral';

@Component({
  selector: 'vy-status-chip',
  template: `<span class="chip" [class]="tone()"><ng-content /></span>`,
  styles: `
    .chip { display: inline-block; padding: 2px 10px; border-radius: 12px; font: var(--mat-sys-label-medium); white-space: nowrap; }
    .ok { background: var(--vy-ok-container); color: var(--vy-on-ok-container); }
    .warn { background: var(--vy-warn-container); color: var(--vy-on-warn-container); }
    .hold { background: var(--vy-hold-container); color: var(--vy-on-hold-container); }
    .neutral { background: var(--mat-sys-surface-container-high); color: var(--mat-sys-on-surface); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StatusChip {
  readonly tone = input<ChipTone>('neutral');
}
