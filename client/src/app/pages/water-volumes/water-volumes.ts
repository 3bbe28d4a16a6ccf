// Water for the mix per product and age range: the entries so far (who entered them, from what) and a form to add one.
import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, signal } from '@angular/core';
import { rxResource, toSignal } from '@angular/core/rxjs-interop';
import { FormGroupDirective, NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelectModule } from '@angular/material/select';
import { ActivatedRoute, RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { applyServerErrors, controlMessage } from '../../core/forms/server-errors';
import { CatalogueApi } from '../../shared/catalogue/catalogue-api';
import { SiteTimePipe } from '../../shared/sites/site-time-pipe';
import { DayApi } from '../../shared/vaccination-day/day-api';

@Component({
  selector: 'vy-water-volumes',
  imports: [ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatIconModule, MatInputModule, MatSelectModule, RouterLink, SiteTimePipe, DecimalPipe],
  templateUrl: './water-volumes.html',
  styleUrl: './water-volumes.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class WaterVolumesPage {
  private readonly api = inject(DayApi);
  private readonly fb = inject(NonNullableFormBuilder);
  private readonly preselected = Number(inject(ActivatedRoute).snapshot.queryParamMap.get('productId')) || null;
  protected readonly message = controlMessage;
  protected readonly products = toSignal(inject(CatalogueApi).products(), { initialValue: [] });
  protected readonly productId = signal<number | null>(this.preselected);
  protected readonly volumes = rxResource({ params: () => ({ productId: this.productId() }), stream: ({ params }) => this.api.waterVolumes(params.productId ?? undefined) });
  protected readonly rows = computed(() => this.volumes.value() ?? []);
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly saved = signal<string | null>(null);
  protected readonly form = this.fb.group({
    productId: this.fb.control<number | null>(this.preselected, Validators.required),
    ageFromDays: this.fb.control<number | null>(null, [Validators.required, Validators.min(0)]),
    ageToDays: this.fb.control<number | null>(null, [Validators.required, Validators.max(1050)]),
    mlPer1000Birds: this.fb.control<number | null>(null, [Validators.required, Validators.min(0.01), Validators.max(100000)]),
    source: this.fb.control<'label' | 'veterinarian' | null>(null, Validators.required),
    note: ['', Validators.maxLength(500)],
  });

  protected filter(productId: number | null): void {
    this.productId.set(productId);
    if (productId) this.form.controls.productId.setValue(productId);
  }

  protected async save(formDir: FormGroupDirective): Promise<void> {
    this.saved.set(null);
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    const v = this.form.getRawValue();
    this.busy.set(true);
    this.error.set(null);
    try {
      await firstValueFrom(this.api.addWaterVolume({ productId: v.productId!, ageFromDays: v.ageFromDays!, ageToDays: v.ageToDays!, mlPer1000Birds: v.mlPer1000Birds!, source: v.source!, note: v.note }));
      this.saved.set(`Saved: ${v.mlPer1000Birds} mL per 1,000 birds for ages ${v.ageFromDays}–${v.ageToDays} days.`);
      // resetForm clears the submitted state too, so the emptied fields do not show as errors.
      formDir.resetForm({ productId: v.productId, ageFromDays: null, ageToDays: null, mlPer1000Birds: null, source: null, note: '' });
      this.volumes.reload();
    } catch (error) {
      this.error.set(applyServerErrors(this.form, error));
    } finally {
      this.busy.set(false);
    }
  }
}
