// The quick daily check: current, minimum and maximum since reset, initials and time; out of range opens an excursion.
// Times are the fridge's site's (typed and shown), so a check entered from another time zone lands where it happened.
import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal, untracked, viewChild } from '@angular/core';
import { rxResource, toSignal } from '@angular/core/rxjs-interop';
import { FormGroupDirective, NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import type { DailyCheckView } from '@shared/fridges/daily-check-schemas.js';
import { siteWallTimeToInstant, siteZoneName } from '@shared/sites/site-clock.js';
import { AuthStore } from '../../core/auth/auth-store';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { SiteTimePipe } from '../../shared/sites/site-time-pipe';
import { TemperaturePipe } from '../../shared/temperature/temperature-pipe';
import { FridgesApi } from '../fridges/fridges-api';

@Component({
  selector: 'vy-daily-check',
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInputModule, MatSelectModule, MatButtonModule, MatButtonToggleModule, RouterLink, SiteTimePipe, TemperaturePipe],
  templateUrl: './daily-check.html',
  styleUrl: './daily-check.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class DailyCheck {
  /** `?fridge=ID` preselects a fridge. */
  readonly fridge = input<string>();
  private readonly api = inject(FridgesApi);
  private readonly auth = inject(AuthStore);
  protected readonly message = controlMessage;
  protected readonly fridges = rxResource({ stream: () => this.api.list() });
  protected readonly saving = signal(false);
  protected readonly formError = signal<string | null>(null);
  protected readonly saved = signal<DailyCheckView | null>(null);

  private readonly fb = inject(NonNullableFormBuilder);
  private readonly formDirective = viewChild.required(FormGroupDirective);
  // Number inputs give numbers, or null when empty.
  protected readonly form = this.fb.group({
    fridgeId: [0, Validators.min(1)],
    unit: [this.auth.displayUnit() as 'F' | 'C'],
    current: this.fb.control<number | null>(null, Validators.required),
    min: this.fb.control<number | null>(null),
    max: this.fb.control<number | null>(null),
    initials: ['', [Validators.required, Validators.pattern(/^\s*[A-Za-z]{1,4}\s*$/)]],
    checkedAt: [''],
    note: ['', Validators.maxLength(500)],
  });
  private readonly chosenId = toSignal(this.form.controls.fridgeId.valueChanges, { initialValue: 0 });
  protected readonly chosen = computed(() => (this.fridges.value() ?? []).find((f) => f.id === this.chosenId()));
  private readonly typedTime = toSignal(this.form.controls.checkedAt.valueChanges, { initialValue: '' });
  /** The site clock's short name at the time typed (or now): a date across a DST change reads CDT, not CST. */
  protected readonly zoneName = computed(() => {
    const zone = this.chosen()?.timeZone;
    if (!zone) return null;
    return siteZoneName(siteWallTimeToInstant(this.typedTime(), zone) ?? new Date(), zone);
  });
  /** The zone of the fridge the saved check belongs to. */
  protected readonly savedZone = computed(() => (this.fridges.value() ?? []).find((f) => f.id === this.saved()?.fridgeId)?.timeZone);

  constructor() {
    effect(() => {
      const list = this.fridges.value() ?? [];
      const wanted = Number(this.fridge() ?? 0);
      untracked(() => {
        if (this.form.controls.fridgeId.value || !list.length) return;
        this.form.controls.fridgeId.setValue(list.find((f) => f.id === wanted)?.id ?? list[0].id);
      });
    });
  }

  protected async save(): Promise<void> {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const v = this.form.getRawValue();
    const zone = this.chosen()?.timeZone ?? 'UTC';
    const checkedAt = v.checkedAt ? siteWallTimeToInstant(v.checkedAt, zone) : null;
    this.saving.set(true);
    this.formError.set(null);
    try {
      const check = await firstValueFrom(
        this.api.recordCheck({
          fridgeId: v.fridgeId,
          unit: v.unit,
          current: v.current!,
          min: v.min,
          max: v.max,
          initials: v.initials.trim().toUpperCase(),
          note: v.note,
          ...(checkedAt && { checkedAt: checkedAt.toISOString() }),
        }),
      );
      this.saved.set(check);
      // Ready for the next check: the fridge, unit and initials stay; resetting through the directive also clears its
      // "submitted" state, or the emptied Current field would show "Required" at once.
      this.formDirective().resetForm({ ...this.form.getRawValue(), current: null, min: null, max: null, note: '', checkedAt: '' });
      this.fridges.reload();
    } catch (error) {
      this.formError.set(applyServerErrors(this.form, error));
    } finally {
      this.saving.set(false);
    }
  }
}
