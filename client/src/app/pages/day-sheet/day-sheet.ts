// The crew lead's day sheet: the day's confirmed vaccinations in visit order, each with birds, doses, the vials to take and the water.
import { ChangeDetectionStrategy, Component, signal } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { DecimalPipe } from '@angular/common';
import { MatButtonModule } from '@angular/material/button';
import { MatCardModule } from '@angular/material/card';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { RouterLink } from '@angular/router';
import { inject } from '@angular/core';
import { StatusChip } from '../../shared/flocks/status-chip';
import { DayApi } from '../../shared/vaccination-day/day-api';
import { localDay } from '../../shared/vaccination-day/local-day';
import { CrewForm } from './crew-form';

@Component({
  selector: 'vy-day-sheet',
  imports: [MatCardModule, MatButtonModule, MatIconModule, MatFormFieldModule, MatInputModule, RouterLink, DecimalPipe, StatusChip, CrewForm],
  templateUrl: './day-sheet.html',
  styleUrl: './day-sheet.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DaySheetPage {
  private readonly api = inject(DayApi);
  protected readonly day = signal(localDay());
  protected readonly sheet = rxResource({ params: () => this.day(), stream: ({ params }) => this.api.sheet(params) });

  protected pick(value: string): void {
    if (/^\d{4}-\d{2}-\d{2}$/.test(value)) this.day.set(value);
  }
}
