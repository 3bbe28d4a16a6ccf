// Chooses the site a page shows, among those the user may see; hidden when there is only one.
import { ChangeDetectionStrategy, Component, input, model } from '@angular/core';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import type { SiteView } from '@shared/sites/site-schemas.js';

@Component({
  selector: 'vy-site-picker',
  imports: [MatFormFieldModule, MatSelectModule],
  template: `
    @if (sites().length > 1) {
      <mat-form-field class="site" subscriptSizing="dynamic">
        <mat-label>Site</mat-label>
        <mat-select [value]="siteId()" (valueChange)="siteId.set($event)">
          @for (site of sites(); track site.id) {
            <mat-option [value]="site.id">{{ site.name }}</mat-option>
          }
        </mat-select>
      </mat-form-field>
    }
  `,
  styles: `.site { min-width: 260px; }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SitePicker {
  readonly sites = input.required<SiteView[]>();
  readonly siteId = model<number | null>(null);
}
