// A fridge's count sheet: each lot's expected vials, what was counted, the difference and why; submitting adjusts stock.
import { ChangeDetectionStrategy, Component, LOCALE_ID, computed, inject, input, signal } from '@angular/core';
import { rxResource, toSignal } from '@angular/core/rxjs-interop';
import { FormArray, NonNullableFormBuilder, ReactiveFormsModule, Validators, type FormGroup, type FormControl } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSnackBar } from '@angular/material/snack-bar';
import { RouterLink } from '@angular/router';
import { firstValueFrom, startWith, tap } from 'rxjs';
import { countDueReasonLabels } from '@shared/lots/count-due.js';
import { AuthStore } from '../../core/auth/auth-store';
import { ApiError } from '../../core/http/api-error';
import { LotStatusChip } from '../../shared/lots/lot-status-chip';
import { SiteTimePipe } from '../../shared/sites/site-time-pipe';
import { siteTimeText } from '@shared/sites/site-clock.js';
import { LotsApi, type CountSheet } from '../../shared/lots/lots-api';

type LineForm = FormGroup<{ counted: FormControl<number | null>; reason: FormControl<string> }>;

@Component({
  selector: 'vy-stock-count',
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInputModule, MatButtonModule, MatIconModule, MatProgressBarModule, RouterLink, SiteTimePipe, LotStatusChip],
  templateUrl: './stock-count.html',
  styleUrl: './stock-count.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StockCountSheet {
  /** From the route (`/fridges/:fridgeId/count`). */
  readonly fridgeId = input.required<string>();
  private readonly api = inject(LotsApi);
  private readonly fb = inject(NonNullableFormBuilder);
  private readonly snackBar = inject(MatSnackBar);
  private readonly auth = inject(AuthStore);
  private readonly locale = inject(LOCALE_ID);
  protected readonly id = computed(() => Number(this.fridgeId()));
  // A fresh sheet (first load or reload) starts a fresh count, set up before the sheet renders.
  protected readonly sheet = rxResource({ params: () => this.id(), stream: ({ params }) => this.api.sheet(params).pipe(tap((sheet) => this.reset(sheet))) });
  protected readonly dueLabels = countDueReasonLabels;
  protected readonly canCount = computed(() => {
    this.auth.user();
    return this.auth.hasRole('admin', 'storage');
  });
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  protected readonly stale = signal(false);

  protected readonly lines = new FormArray<LineForm>([]);
  protected readonly form = this.fb.group({ lines: this.lines, notes: [''] });
  private readonly values = toSignal(this.form.valueChanges.pipe(startWith(null)));

  /** Bumped on every fresh sheet. Each row carries the version it was made in, so a reload draws every row anew and
   * its fields bind to the new controls (@for compares rows by their own key, not by a key recomputed now). */
  private version = 0;
  protected readonly rows = signal<(CountSheet['lines'][number] & { key: string })[]>([]);

  private reset(sheet: CountSheet): void {
    this.version++;
    this.lines.clear();
    for (const _line of sheet.lines) {
      this.lines.push(this.fb.group({ counted: this.fb.control<number | null>(null, [Validators.required, Validators.min(0)]), reason: this.fb.control('') }));
    }
    this.rows.set(sheet.lines.map((line) => ({ ...line, key: `${this.version}:${line.lotId}` })));
    this.form.controls.notes.setValue('');
    this.stale.set(false);
    this.formError.set(null);
  }

  /** Counted − expected for line i, or null until counted. */
  protected difference(index: number): number | null {
    this.values();
    const counted = this.lines.at(index)?.controls.counted.value;
    const expected = this.rows()[index]?.expected;
    return counted === null || counted === undefined || expected === undefined || Number.isNaN(counted) ? null : counted - expected;
  }

  protected differenceText(index: number): string {
    const d = this.difference(index);
    return d === null ? 'not counted' : d === 0 ? 'matches' : d > 0 ? `${d} more than expected` : `${-d} fewer than expected`;
  }

  /** The day the next count is due, on the site's calendar. */
  protected dueDay(sheet: CountSheet): string {
    return sheet.due.dueAt != null ? siteTimeText(sheet.due.dueAt, sheet.fridge.timeZone, 'date', this.locale) : '—';
  }

  protected dueReasons(sheet: CountSheet): string {
    return sheet.due.reasons.map((r) => this.dueLabels[r]).join('; ');
  }

  protected async submit(sheet: CountSheet): Promise<void> {
    this.formError.set(null);
    let problem = false;
    this.rows().forEach((_line, index) => {
      const group = this.lines.at(index);
      const difference = this.difference(index);
      if (difference !== null && difference !== 0 && !group.controls.reason.value.trim()) {
        group.controls.reason.setErrors({ server: 'Say why the count differs.' });
        group.controls.reason.markAsTouched();
        problem = true;
      }
    });
    if (this.form.invalid || problem) {
      this.form.markAllAsTouched();
      this.formError.set('Count every lot (0 if none is there) and give a reason for each difference.');
      return;
    }
    this.saving.set(true);
    try {
      const lines = this.rows().map((line, index) => ({ lotId: line.lotId, expected: line.expected, counted: this.lines.at(index).controls.counted.value!, reason: this.lines.at(index).controls.reason.value }));
      const result = await firstValueFrom(this.api.submitCount(sheet.fridge.id, { lines, notes: this.form.controls.notes.value }));
      this.snackBar.open(result.adjustments ? `Count saved; ${result.adjustments} adjustment${result.adjustments === 1 ? '' : 's'} posted.` : 'Count saved; every lot matched.', 'Dismiss', { duration: 8000 });
      this.sheet.reload();
    } catch (error) {
      const apiError = ApiError.from(error);
      this.stale.set(apiError.status === 409);
      this.formError.set(apiError.message);
    } finally {
      this.saving.set(false);
    }
  }
}
