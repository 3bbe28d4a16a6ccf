// The fridge's temperature chart for a day, week, month, year or any range, with the allowed band and excursions shaded.
import { ChangeDetectionStrategy, Component, computed, effect, inject, input, signal, untracked, viewChild } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { DatePipe, DecimalPipe } from '@angular/common';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatExpansionModule } from '@angular/material/expansion';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatPaginator, MatPaginatorModule } from '@angular/material/paginator';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { MatTableDataSource, MatTableModule } from '@angular/material/table';
import type { Chart, ChartConfiguration, Plugin } from 'chart.js';
import { BaseChartDirective, provideCharts, withDefaultRegisterables } from 'ng2-charts';
import type { ExcursionView } from '@shared/fridges/excursion-view.js';
import { AuthStore } from '../../core/auth/auth-store';
import { FridgesApi } from '../fridges/fridges-api';
import { chartColors } from './chart-colors';
import { rangeEnding, shiftRange, spanLabels, type ChartRange, type RangeSpan } from './chart-range';
import { chartSeries, chartTableRows, type ChartTableRow } from './chart-rows';

const timeLabel = new Intl.DateTimeFormat(undefined, { month: 'short', day: 'numeric', hour: '2-digit', minute: '2-digit' });
const dayLabel = new Intl.DateTimeFormat(undefined, { year: 'numeric', month: 'short', day: 'numeric' });

/** Draws each excursion's span as a shaded column behind the lines. */
function excursionShading(excursions: () => ExcursionView[], color: string): Plugin<'line'> {
  return {
    id: 'vyExcursions',
    beforeDatasetsDraw(chart: Chart) {
      const { ctx, chartArea, scales } = chart;
      ctx.save();
      ctx.fillStyle = color;
      for (const e of excursions()) {
        const left = Math.max(scales['x'].getPixelForValue(Date.parse(e.start)), chartArea.left);
        const right = Math.min(scales['x'].getPixelForValue(Date.parse(e.end)), chartArea.right);
        if (right > left - 2) ctx.fillRect(left, chartArea.top, Math.max(right - left, 3), chartArea.bottom - chartArea.top);
      }
      ctx.restore();
    },
  };
}

@Component({
  selector: 'vy-fridge-chart',
  imports: [BaseChartDirective, MatButtonToggleModule, MatButtonModule, MatIconModule, MatFormFieldModule, MatInputModule, MatExpansionModule, MatTableModule, MatPaginatorModule, MatProgressBarModule, DatePipe, DecimalPipe],
  providers: [provideCharts(withDefaultRegisterables())],
  templateUrl: './fridge-chart.html',
  styleUrl: './fridge-chart.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FridgeChart {
  readonly fridgeId = input.required<number>();
  readonly excursions = input<ExcursionView[]>([]);
  /** The newest reading: the first range shown ends there, so a fridge without recent data still shows its last week. */
  readonly endAt = input<string | null>(null);
  private readonly api = inject(FridgesApi);
  private readonly auth = inject(AuthStore);
  private readonly colors = chartColors();
  protected readonly spans: RangeSpan[] = ['day', 'week', 'month', 'year', 'custom'];
  protected readonly spanLabels = spanLabels;
  protected readonly unit = this.auth.displayUnit;
  protected readonly range = signal<ChartRange>(rangeEnding('week', new Date()));
  protected readonly data = rxResource({
    params: () => ({ id: this.fridgeId(), from: this.range().from, to: this.range().to }),
    stream: ({ params }) => this.api.chart(params.id, params.from, params.to),
  });
  protected readonly plugins = [excursionShading(() => this.excursions(), this.colors.excursion)];
  protected readonly tableColumns = ['at', 'value', 'source'];
  protected readonly tableData = new MatTableDataSource<ChartTableRow>([]);
  private readonly paginator = viewChild(MatPaginator);

  protected readonly summary = computed(() => {
    const data = this.data.value();
    if (!data) return 'Loading the chart.';
    const count = data.primary.points.length + data.primary.buckets.length;
    if (!count) return `No readings between ${dayLabel.format(this.range().from)} and ${dayLabel.format(this.range().to)}.`;
    const kind = data.bucketMinutes ? `lowest and highest per ${data.bucketMinutes >= 60 ? `${data.bucketMinutes / 60} h` : `${data.bucketMinutes} min`}` : 'every reading';
    return `Temperatures in °${this.unit()} from ${dayLabel.format(this.range().from)} to ${dayLabel.format(this.range().to)}, ${kind}; shaded columns are excursions.`;
  });

  protected readonly config = computed<ChartConfiguration<'line'>>(() => {
    const data = this.data.value();
    const unit = this.unit();
    const range = this.range();
    const c = this.colors;
    const s = data ? chartSeries(data, unit) : { primaryPoints: [], highs: [], lows: [], backup: [], low: 0, high: 0 };
    const band = data ? [{ x: range.from.getTime(), y: s.high }, { x: range.to.getTime(), y: s.high }] : [];
    const datasets: ChartConfiguration<'line'>['data']['datasets'] = [
      { label: 'Allowed range', data: band, borderColor: 'transparent', backgroundColor: c.band, fill: { value: s.low }, pointRadius: 0, order: 3 },
      ...(s.primaryPoints.length ? [{ label: 'Readings', data: s.primaryPoints, borderColor: c.line, backgroundColor: c.line, borderWidth: 1.5, pointRadius: s.primaryPoints.length < 200 ? 2 : 0, spanGaps: false, order: 1 }] : []),
      ...(s.highs.length
        ? [
            { label: 'Highest', data: s.highs, borderColor: c.line, backgroundColor: c.line, borderWidth: 1.2, pointRadius: 0, spanGaps: false, order: 1 },
            { label: 'Lowest', data: s.lows, borderColor: c.line, backgroundColor: c.band, borderWidth: 1.2, pointRadius: 0, spanGaps: false, fill: '-1', order: 1 },
          ]
        : []),
      ...(s.backup.length ? [{ label: 'Backup logger (filling a gap)', data: s.backup, borderColor: c.backup, backgroundColor: c.backup, showLine: false, pointRadius: 2.5, pointStyle: 'rectRot', order: 0 }] : []),
    ];
    return {
      type: 'line',
      data: { datasets },
      options: {
        animation: false,
        maintainAspectRatio: false,
        parsing: false,
        normalized: true,
        interaction: { mode: 'nearest', intersect: false },
        plugins: {
          legend: { labels: { color: c.text, filter: (item) => item.text !== 'Lowest' } },
          tooltip: { callbacks: { title: (items) => (items[0] ? timeLabel.format(items[0].parsed.x ?? 0) : ''), label: (item) => `${item.dataset.label}: ${item.parsed.y} °${unit}` } },
        },
        scales: {
          x: { type: 'linear', min: range.from.getTime(), max: range.to.getTime(), ticks: { color: c.text, maxTicksLimit: 8, callback: (v) => (range.to.getTime() - range.from.getTime() > 3 * 86_400_000 ? dayLabel : timeLabel).format(Number(v)) }, grid: { color: c.grid } },
          // The allowed band always shows in full, with a little room either side.
          y: { suggestedMin: s.low - (s.high - s.low) * 0.15, suggestedMax: s.high + (s.high - s.low) * 0.15, title: { display: true, text: `°${unit}`, color: c.text }, ticks: { color: c.text }, grid: { color: c.grid } },
        },
      },
    };
  });

  protected readonly rows = computed(() => {
    const data = this.data.value();
    return data ? chartTableRows(data, this.unit()) : [];
  });

  constructor() {
    effect(() => {
      const end = this.endAt();
      untracked(() => {
        if (end && !this.moved) this.range.set(rangeEnding('week', new Date(Date.parse(end) + 60_000)));
      });
    });
    // The table's data source is not a signal; keep it fed from the rows.
    effect(() => {
      this.tableData.data = this.rows();
      const paginator = this.paginator();
      if (paginator) this.tableData.paginator = paginator;
    });
  }

  /** Set once the person picks a range, so later data does not move it under them. */
  private moved = false;

  protected chooseSpan(span: RangeSpan): void {
    this.moved = true;
    if (span === 'custom') this.range.update((r) => ({ ...r, span }));
    else this.range.update((r) => rangeEnding(span, r.to));
  }

  protected move(direction: -1 | 1): void {
    this.moved = true;
    this.range.update((r) => shiftRange(r, direction));
  }

  protected setCustom(which: 'from' | 'to', value: string): void {
    this.moved = true;
    const date = new Date(`${value}T00:00`);
    if (Number.isNaN(date.getTime())) return;
    this.range.update((r) => {
      const next = { ...r, span: 'custom' as const, [which]: which === 'to' ? new Date(date.getTime() + 86_400_000) : date };
      return next.to > next.from ? next : r;
    });
  }

  protected dateInput(date: Date, which: 'from' | 'to'): string {
    const d = which === 'to' ? new Date(date.getTime() - 1) : date;
    return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, '0')}-${String(d.getDate()).padStart(2, '0')}`;
  }
}
