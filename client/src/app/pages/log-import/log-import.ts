// Import a logger file: choose the logger and the file, check the column mapping on a preview, upload with progress.
import { HttpEventType } from '@angular/common/http';
import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal, untracked, viewChild, type ElementRef } from '@angular/core';
import { rxResource, toSignal } from '@angular/core/rxjs-interop';
import { DecimalPipe } from '@angular/common';
import { NonNullableFormBuilder, ReactiveFormsModule } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatSelectModule } from '@angular/material/select';
import { RouterLink } from '@angular/router';
import { interval, type Subscription } from 'rxjs';
import type { ImportOutcome, ImportProgress } from '@shared/fridges/log-import-view.js';
import type { StoredLogMapping } from '@shared/fridges/log-mapping-schema.js';
import { sniffLog, type LogNeed } from '@shared/logs/index.js';
import { ApiError } from '../../core/http/api-error';
import { SiteTimePipe } from '../../shared/sites/site-time-pipe';
import { TemperaturePipe } from '../../shared/temperature/temperature-pipe';
import { FridgesApi } from '../fridges/fridges-api';
import { previewReadings } from './preview-readings';
import { readFileHead } from './read-file-head';

const needLabels: Record<LogNeed, string> = {
  header: 'the line holding the column names',
  timeColumn: 'the time column',
  tempColumn: 'the temperature column',
  unit: 'the unit',
  dateOrder: 'the order of day and month',
  zone: 'the time zone',
};

const phaseLabels: Record<ImportProgress['phase'], string> = {
  reading: 'Reading the file',
  storing: 'Storing the readings',
  analysing: 'Finding excursions and gaps',
  done: 'Done',
  failed: 'Stopped',
};

@Component({
  selector: 'vy-log-import',
  imports: [ReactiveFormsModule, MatFormFieldModule, MatSelectModule, MatInputModule, MatButtonModule, MatIconModule, MatProgressBarModule, RouterLink, SiteTimePipe, DecimalPipe, TemperaturePipe],
  templateUrl: './log-import.html',
  styleUrl: './log-import.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LogImport {
  /** From the route (`/fridges/:fridgeId/import`). */
  readonly fridgeId = input.required<string>();
  private readonly api = inject(FridgesApi);
  protected readonly fridge = rxResource({ params: () => Number(this.fridgeId()), stream: ({ params }) => this.api.get(params) });
  protected readonly loggers = computed(() => (this.fridge.value()?.loggers ?? []).filter((l) => !l.removedOn));
  protected readonly file = signal<File | null>(null);
  protected readonly lines = signal<string[]>([]);
  protected readonly uploading = signal(false);
  protected readonly uploadFraction = signal(0);
  protected readonly serverProgress = signal<ImportProgress | null>(null);
  protected readonly outcome = signal<ImportOutcome | null>(null);
  protected readonly failure = signal<string | null>(null);
  protected readonly phaseLabels = phaseLabels;

  protected readonly form = inject(NonNullableFormBuilder).group({
    loggerId: [0],
    headerLine: [0],
    timeColumn: [''],
    dateColumn: [''],
    tempColumn: [''],
    unit: [''],
    dateOrder: [''],
    zone: [''],
  });
  private readonly formValue = toSignal(this.form.valueChanges, { initialValue: this.form.getRawValue() });

  /** Only what the person chose (or the logger remembered): everything else is detected. */
  protected readonly mapping = computed<StoredLogMapping>(() => {
    const v = { ...this.form.getRawValue(), ...this.formValue() };
    const column = (text: string | undefined) => (text === undefined || text === '' ? undefined : /^#\d+$/.test(text) ? Number(text.slice(1)) : text);
    return Object.fromEntries(
      Object.entries({
        headerLine: v.headerLine ? Number(v.headerLine) : undefined,
        timeColumn: column(v.timeColumn),
        dateColumn: column(v.dateColumn),
        tempColumn: column(v.tempColumn),
        unit: v.unit || undefined,
        dateOrder: v.dateOrder || undefined,
        zone: v.zone || undefined,
      }).filter(([, value]) => value !== undefined),
    ) as StoredLogMapping;
  });
  protected readonly sniff = computed(() => {
    const lines = this.lines();
    if (!lines.length) return null;
    const mapping = this.mapping();
    return sniffLog(lines, { ...mapping, zone: mapping.zone ?? this.fridge.value()?.timeZone });
  });
  protected readonly preview = computed(() => {
    const sniff = this.sniff();
    return sniff && !sniff.needs.length ? previewReadings(sniff, this.lines()) : null;
  });
  protected readonly needs = computed(() => (this.sniff()?.needs ?? []).map((need) => needLabels[need]));
  /** A day/month order no early row settles may still be settled further down: the server reads the whole file. */
  protected readonly canImport = computed(() => {
    const needs = this.sniff()?.needs ?? ['header'];
    return !!this.file() && !this.uploading() && needs.every((need) => need === 'dateOrder') && !!this.form.getRawValue().loggerId;
  });
  protected readonly columnOptions = computed(() => {
    const header = this.sniff()?.header ?? [];
    const width = Math.max(header.length, ...(this.sniff()?.preview ?? []).map((p) => p.fields.length));
    return Array.from({ length: width }, (_, i) => {
      const name = header[i] ?? '';
      const unique = name !== '' && header.filter((h) => h === name).length === 1;
      return { value: unique ? name : `#${i}`, label: name ? `${name} (column ${i + 1})` : `Column ${i + 1}` };
    });
  });
  protected readonly roles = computed(() => {
    const found = this.sniff()?.found;
    return new Map<number, string>([
      ...(found?.timeColumn !== undefined ? [[found.timeColumn, found.dateColumn !== undefined ? 'time of day' : 'time'] as [number, string]] : []),
      ...(found?.dateColumn !== undefined ? [[found.dateColumn, 'date'] as [number, string]] : []),
      ...(found?.tempColumn !== undefined ? [[found.tempColumn, `temperature${found.unit ? ` (°${found.unit})` : ''}`] as [number, string]] : []),
    ]);
  });
  protected readonly headerLine = computed(() => this.sniff()?.found.headerLine ?? 0);

  private polling?: Subscription;
  private readonly outcomeBox = viewChild<ElementRef<HTMLElement>>('outcomeBox');

  constructor() {
    // The result of a long import appears below the preview: bring it into view.
    effect(() => this.outcomeBox()?.nativeElement.scrollIntoView({ block: 'nearest' }));
    // A logger's remembered mapping is offered again, so its next file is one click.
    effect(() => {
      const loggers = this.loggers();
      untracked(() => {
        if (!loggers.length || this.form.controls.loggerId.value) return;
        const primary = loggers.find((l) => l.role === 'primary') ?? loggers[0];
        this.chooseLogger(primary.id);
      });
    });
  }

  protected chooseLogger(id: number): void {
    const logger = this.loggers().find((l) => l.id === id);
    const m = logger?.mapping ?? {};
    const text = (value: string | number | undefined) => (value === undefined ? '' : typeof value === 'number' ? `#${value}` : value);
    this.form.setValue({
      loggerId: id,
      headerLine: m.headerLine ?? 0,
      timeColumn: text(m.timeColumn),
      dateColumn: text(m.dateColumn),
      tempColumn: text(m.tempColumn),
      unit: m.unit ?? '',
      dateOrder: m.dateOrder ?? '',
      zone: m.zone ?? '',
    });
  }

  protected async pickFile(event: Event): Promise<void> {
    const file = (event.target as HTMLInputElement).files?.[0] ?? null;
    this.outcome.set(null);
    this.failure.set(null);
    this.file.set(file);
    this.lines.set(file ? await readFileHead(file) : []);
  }

  protected async startImport(): Promise<void> {
    const file = this.file();
    if (!file || !this.canImport()) return;
    const token = crypto.randomUUID();
    this.uploading.set(true);
    this.outcome.set(null);
    this.failure.set(null);
    this.uploadFraction.set(0);
    this.serverProgress.set(null);
    this.polling = interval(400).subscribe(() => {
      if (this.uploadFraction() < 1) return;
      this.api.progress(token).subscribe({ next: (p) => this.serverProgress.set(p), error: () => undefined });
    });
    try {
      const events = this.api.upload(this.form.getRawValue().loggerId, file, this.mapping(), token);
      await new Promise<void>((resolve, reject) =>
        events.subscribe({
          next: (event) => {
            if (event.type === HttpEventType.UploadProgress) this.uploadFraction.set(event.total ? event.loaded / event.total : 0);
            if (event.type === HttpEventType.Response && event.body) this.outcome.set(event.body);
          },
          error: reject,
          complete: resolve,
        }),
      );
      this.fridge.reload();
    } catch (error) {
      this.failure.set(ApiError.from(error).message);
    } finally {
      this.polling.unsubscribe();
      this.uploading.set(false);
    }
  }

  protected progressText(): string {
    const fraction = this.uploadFraction();
    if (fraction < 1) return `Uploading ${Math.round(fraction * 100)} %`;
    const p = this.serverProgress();
    if (!p) return 'Waiting for the server';
    return p.phase === 'reading' && p.total ? `${phaseLabels.reading} ${Math.round((p.done / p.total) * 100)} %` : phaseLabels[p.phase];
  }

  protected progressValue(): number {
    const fraction = this.uploadFraction();
    if (fraction < 1) return fraction * 50;
    const p = this.serverProgress();
    if (!p) return 50;
    if (p.phase === 'reading') return 50 + (p.total ? (p.done / p.total) * 30 : 0);
    return p.phase === 'storing' ? 85 : p.phase === 'analysing' ? 95 : 100;
  }
}
