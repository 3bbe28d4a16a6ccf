// A lot's status in words (never colour alone): usable, on hold with its causes, expired, discarded, used up.
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { holdCauseLabels, type HoldCause } from '@shared/lots/hold-causes.js';
import { lotStatusLabels } from '@shared/lots/lot-list-options.js';
import type { LotStatus } from '@shared/lots/lot-status.js';
import { StatusChip, type ChipTone } from '../flocks/status-chip';

const tones: Record<LotStatus, ChipTone> = { usable: 'ok', on_hold: 'hold', expired: 'warn', discarded: 'neutral', used_up: 'neutral' };

@Component({
  selector: 'vy-lot-status-chip',
  imports: [StatusChip],
  template: `<vy-status-chip [tone]="tone()">{{ text() }}</vy-status-chip>`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LotStatusChip {
  readonly status = input.required<LotStatus>();
  readonly causes = input<readonly HoldCause[]>([]);
  protected readonly tone = computed(() => tones[this.status()]);
  protected readonly text = computed(() => {
    const label = lotStatusLabels[this.status()];
    const causes = this.causes();
    return this.status() === 'on_hold' && causes.length ? `${label}: ${causes.map((c) => holdCauseLabels[c].toLowerCase()).join(', ')}` : label;
  });
}
