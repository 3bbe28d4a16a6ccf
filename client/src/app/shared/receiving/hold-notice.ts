// The "do not use" notice for a held lot: why, and that the veterinarian decides and the label governs.
import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import { MatIconModule } from '@angular/material/icon';
import type { HoldView } from '@shared/lots/hold-causes.js';
import { holdCauseLabels } from '@shared/lots/hold-causes.js';

@Component({
  selector: 'vy-hold-notice',
  imports: [MatIconModule],
  template: `
    <div class="hold" role="note">
      <mat-icon aria-hidden="true">block</mat-icon>
      <div>
        <strong>On hold: do not use.</strong>
        @for (hold of holds(); track hold.id) {
          <p>{{ causeLabels[hold.cause] }} hold: {{ hold.reason }}</p>
        }
        <p class="advice">Keep the vials refrigerated. The flock veterinarian decides what happens to this lot; the product label governs.</p>
      </div>
    </div>
  `,
  styles: `
    .hold { display: flex; gap: 8px; padding: 8px 12px; border-radius: 8px; background: var(--vy-hold-container); color: var(--vy-on-hold-container); }
    p { margin: 4px 0 0; }
    .advice { font: var(--mat-sys-body-small); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class HoldNotice {
  readonly holds = input.required<HoldView[]>();
  protected readonly causeLabels = holdCauseLabels;
}
