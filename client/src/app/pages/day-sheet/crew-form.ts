// Who works a site on the day: the crew lead and the members (an admin or veterinarian assigns any lead; a crew lead, their own day).
import { ChangeDetectionStrategy, Component, computed, effect, inject, input, output, signal, untracked } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatSelectModule } from '@angular/material/select';
import { firstValueFrom } from 'rxjs';
import { AuthStore } from '../../core/auth/auth-store';
import { ApiError } from '../../core/http/api-error';
import { SitesApi } from '../../core/sites/sites-api';
import { DayApi } from '../../shared/vaccination-day/day-api';

@Component({
  selector: 'vy-crew-form',
  imports: [MatButtonModule, MatFormFieldModule, MatSelectModule],
  template: `
    <section aria-labelledby="crew-title">
      <h2 id="crew-title">Crew for a site</h2>
      <div class="fields">
        <mat-form-field><mat-label>Site</mat-label>
          <mat-select [value]="siteId()" (valueChange)="siteId.set($event)">
            @for (s of sites.value() ?? []; track s.id) { <mat-option [value]="s.id">{{ s.name }}</mat-option> }
          </mat-select></mat-form-field>
        @if (crew.value(); as c) {
          <p>{{ c.crew ? 'Crew lead: ' + c.crew.leadName + (c.crew.members.length ? '; crew: ' + memberNames() : '') : 'No crew assigned on ' + day() + '.' }}</p>
          <mat-form-field><mat-label>Crew lead</mat-label>
            <mat-select [value]="leadId()" (valueChange)="leadId.set($event)" [disabled]="!planner()">
              @for (p of c.candidates; track p.id) { <mat-option [value]="p.id">{{ p.name }}</mat-option> }
            </mat-select></mat-form-field>
          <mat-form-field><mat-label>Crew members</mat-label>
            <mat-select multiple [value]="memberIds()" (valueChange)="memberIds.set($event)">
              @for (p of c.candidates; track p.id) { <mat-option [value]="p.id">{{ p.name }}</mat-option> }
            </mat-select></mat-form-field>
          @if (error(); as e) { <p class="form-error" role="alert">{{ e }}</p> }
          <div><button mat-stroked-button type="button" (click)="save()" [disabled]="busy() || !leadId()">Save the crew</button></div>
        }
      </div>
    </section>
  `,
  styles: `
    section { border-top: 1px solid var(--mat-sys-outline-variant); margin-top: 16px; padding-top: 8px; }
    h2 { font: var(--mat-sys-title-large); margin: 0 0 8px; }
    .fields { display: flex; flex-direction: column; max-width: 480px; }
    .form-error { color: var(--mat-sys-error); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CrewForm {
  readonly day = input.required<string>();
  readonly saved = output<void>();
  private readonly api = inject(DayApi);
  private readonly auth = inject(AuthStore);
  private readonly sitesApi = inject(SitesApi);
  protected readonly sites = rxResource({ stream: () => this.sitesApi.list() });
  protected readonly siteId = signal<number | null>(null);
  protected readonly crew = rxResource({
    params: () => (this.siteId() ? { siteId: this.siteId()!, day: this.day() } : undefined),
    stream: ({ params }) => this.api.crew(params.siteId, params.day),
  });
  protected readonly leadId = signal<number | null>(null);
  protected readonly memberIds = signal<number[]>([]);
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly planner = computed(() => {
    this.auth.user();
    return this.auth.hasRole('admin', 'veterinarian');
  });
  protected readonly memberNames = computed(() => (this.crew.value()?.crew?.members ?? []).map((m) => m.name).join(', '));

  constructor() {
    effect(() => {
      const list = this.sites.value() ?? [];
      untracked(() => {
        if (!this.siteId() && list.length) this.siteId.set(list[0].id);
      });
    });
    effect(() => {
      const c = this.crew.value();
      untracked(() => {
        this.leadId.set(c?.crew?.leadId ?? (this.planner() ? null : (this.auth.user()?.id ?? null)));
        this.memberIds.set(c?.crew?.members.map((m) => m.id) ?? []);
      });
    });
  }

  protected async save(): Promise<void> {
    this.busy.set(true);
    this.error.set(null);
    try {
      await firstValueFrom(this.api.assignCrew({ siteId: this.siteId()!, day: this.day(), leadId: this.leadId()!, memberIds: this.memberIds() }));
      this.crew.reload();
      this.saved.emit();
    } catch (error) {
      this.error.set(ApiError.from(error).message);
    } finally {
      this.busy.set(false);
    }
  }
}
