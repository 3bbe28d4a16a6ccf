// The fridge's temperature chart for a day, week, month, year or any range, with the allowed band and excursions shaded.
// The review embeds it too: a fixed window around one event, shaded with the product's range instead of the fridge's.
// Times (axis, tooltips, table, date fields) are on the site's clock, the axis titled with the zone's name.
import { ChangeDetectionStrategy, Component, LOCALE_ID, computed, effect, inject, input, signal, untracked, viewChild } from '@angular/core';
import { rxResource } from '@angular/core/rxjs-interop';
import { DecimalPipe } from '@angular/common';
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
import { siteTimeText, siteWallTime, siteWallTimeToInstant, siteZoneName } from '@shared/sites/site-clock.js';
import { AuthStore } from '../../core/auth/auth-store';
import { SiteTimePipe, readerTimeZone } from '../../shared/sites/site-time-pipe';
import { FridgesApi } from '../fridges/fridges-api';
import { chartColors } from './chart-colors';
import { rangeEnding, shiftRange, spanLabels, type ChartRange, type RangeSpan } from './chart-range';
import { chartSeries, chartTableRows, type ChartTableRow } from './chart-rows';

/** The axis's and summary's labels on the zone's clock (built once per zone: building a formatter is the costly part). */
function labelsFor(timeZone: string) {
  return {
    time: new Intl.DateTimeFormat(undefined, { month: 'short', day: 'numeric', hour: '2-digit', minute: '2-digit', timeZone }),
    day: new Intl.DateTimeFormat(undefined, { year: 'numeric', month: 'short', day: 'numeric', timeZone }),
  };
}

/** What the chart needs of an excursion: its span. */
export type ChartExcursion = Pick<ExcursionView, 'start' | 'end'>;

/** A band to shade instead of the fridge's alarm range, such as a product's label range. */
export interface ChartBand {
  lowC: number;
  highC: number;
  label: string;
}

let nextChartId = 0;

/** "2026-12-04" → "2026-12-05", on the calendar alone. */
function nextDay(day: string): string {
  return new Date(Date.parse(`${day}T00:00:00Z`) + 86_400_000).toISOString().slice(0, 10);
}

/** Draws each excursion's span as a shaded column behind the lines. */
function excursionShading(excursions: () => ChartExcursion[], color: string): Plugin<'line'> {
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
  imports: [BaseChartDirective, MatButtonToggleModule, MatButtonModule, MatIconModule, MatFormFieldModule, MatInputModule, MatExpansionModule, MatTableModule, MatPaginatorModule, MatProgressBarModule, DecimalPipe, SiteTimePipe],
  providers: [provideCharts(withDefaultRegisterables())],
  templateUrl: './fridge-chart.html',
  styleUrl: './fridge-chart.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FridgeChart {
  readonly fridgeId = input.required<number>();
  /** The fridge's site's zone: every time on the chart is on its clock (none given: the reader's own). */
  readonly timeZone = input<string | null>(null);
  readonly excursions = input<ChartExcursion[]>([]);
  /** The newest reading: the first range shown ends there, so a fridge without recent data still shows its last week. */
  readonly endAt = input<string | null>(null);
  /** A fixed first range (ISO instants), shown as a custom range; it wins over `endAt`. */
  readonly window = input<{ from: string; to: string } | null>(null);
  /** The toggle that brings the window back. */
  readonly windowLabel = input('Around the event');
  /** The band shaded as allowed; the fridge's alarm range when not given. */
  readonly band = input<ChartBand | null>(null);
  readonly heading = input('Temperatures');
  /** 3 when the chart sits inside a section that already has an h2. */
  readonly headingLevel = input<2 | 3>(2);
  /** Unique per chart, so several charts on one page keep their labels apart. */
  protected readonly uid = `fridge-chart-${++nextChartId}`;
  private readonly api = inject(FridgesApi);
  private readonly auth = inject(AuthStore);
  private readonly colors = chartColors();
  private readonly locale = inject(LOCALE_ID);
  protected readonly zone = computed(() => this.timeZone() || readerTimeZone());
  private readonly labels = computed(() => labelsFor(this.zone()));
  /** "CST"; "CST, CDT" when the range crosses a clock change. */
  private readonly zoneNames = computed(() => {
    const { from, to } = this.range();
    return [...new Set([siteZoneName(from, this.zone()), siteZoneName(to, this.zone())])].join(', ');
  });
  /** The axis's and the table's time heading: "Time at the site (CST)". */
  protected readonly axisTitle = computed(() => `${this.timeZone() ? 'Time at the site' : 'Your time'} (${this.zoneNames()})`);
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
    const { day: dayLabel, time: timeLabel } = this.labels();
    const count = data.primary.points.length + data.primary.buckets.length;
    if (!count) return `No readings between ${dayLabel.format(this.range().from)} and ${dayLabel.format(this.range().to)}.`;
    const kind = data.bucketMinutes ? `lowest and highest per ${data.bucketMinutes >= 60 ? `${data.bucketMinutes / 60} h` : `${data.bucketMinutes} min`}` : 'every reading';
    const band = this.band();
    const bandText = band ? `; the shaded band is the ${band.label.toLowerCase()}` : '';
    const label = this.range().to.getTime() - this.range().from.getTime() > 2 * 86_400_000 ? dayLabel : timeLabel;
    return `Temperatures in °${this.unit()} from ${label.format(this.range().from)} to ${label.format(this.range().to)} (${this.timeZone() ? "the site's clock" : 'your clock'}, ${this.zoneNames()}), ${kind}; shaded columns are excursions${bandText}.`;
  });

  protected readonly config = computed<ChartConfiguration<'line'>>(() => {
    const data = this.data.value();
    const unit = this.unit();
    const range = this.range();
    const c = this.colors;
    const { day: dayLabel, time: timeLabel } = this.labels();
    const zone = this.zone();
    const axisTitle = this.axisTitle();
    const s = data ? chartSeries(data, unit, this.band()) : { primaryPoints: [], highs: [], lows: [], backup: [], low: 0, high: 0 };
    const band = data ? [{ x: range.from.getTime(), y: s.high }, { x: range.to.getTime(), y: s.high }] : [];
    const datasets: ChartConfiguration<'line'>['data']['datasets'] = [
      { label: this.band()?.label ?? 'Allowed range', data: band, borderColor: 'transparent', backgroundColor: c.band, fill: { value: s.low }, pointRadius: 0, order: 3 },
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
          tooltip: { callbacks: { title: (items) => (items[0] ? siteTimeText(items[0].parsed.x ?? 0, zone, 'medium', this.locale) : ''), label: (item) => `${item.dataset.label}: ${item.parsed.y} °${unit}` } },
        },
        scales: {
          x: { type: 'linear', min: range.from.getTime(), max: range.to.getTime(), ticks: { color: c.text, maxTicksLimit: 8, callback: (v) => (range.to.getTime() - range.from.getTime() > 3 * 86_400_000 ? dayLabel : timeLabel).format(Number(v)) }, title: { display: true, text: axisTitle, color: c.text }, grid: { color: c.grid } },
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
      const window = this.window();
      untracked(() => {
        if (this.moved) return;
        this.onWindow.set(!!window);
        if (window) this.range.set({ span: 'custom', from: new Date(window.from), to: new Date(window.to) });
        else if (end) this.range.set(rangeEnding('week', new Date(Date.parse(end) + 60_000)));
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

  /** The date fields show once the person picks "Range"; a given window is custom too, but in hours, not days. */
  protected readonly pickingDates = signal(false);
  /** Whether the given window is what shows (its own toggle, "Around the event"). */
  protected readonly onWindow = signal(false);
  protected readonly toggleValue = computed(() => (this.onWindow() ? 'window' : this.range().span));

  protected chooseSpan(span: RangeSpan | 'window'): void {
    this.moved = true;
    this.pickingDates.set(span === 'custom');
    this.onWindow.set(span === 'window');
    const window = this.window();
    if (span === 'window') {
      if (window) this.range.set({ span: 'custom', from: new Date(window.from), to: new Date(window.to) });
    } else if (span === 'custom') this.range.update((r) => ({ ...r, span }));
    else this.range.update((r) => rangeEnding(span, r.to));
  }

  protected move(direction: -1 | 1): void {
    this.moved = true;
    this.onWindow.set(false);
    this.range.update((r) => shiftRange(r, direction));
  }

  /** A picked day starts at the site's midnight. */
  protected setCustom(which: 'from' | 'to', value: string): void {
    this.moved = true;
    this.onWindow.set(false);
    const date = siteWallTimeToInstant(`${value}T00:00`, this.zone());
    if (!date) return;
    this.range.update((r) => {
      // The day after's midnight, not 24 h later: a day of a clock change lasts 23 or 25 hours.
      const dayAfter = siteWallTimeToInstant(`${nextDay(value)}T00:00`, this.zone())!;
      const next = { ...r, span: 'custom' as const, [which]: which === 'to' ? dayAfter : date };
      return next.to > next.from ? next : r;
    });
  }

  /** The site's calendar day of the range's start, or of its last moment. */
  protected dateInput(date: Date, which: 'from' | 'to'): string {
    return siteWallTime(which === 'to' ? date.getTime() - 1 : date, this.zone()).slice(0, 10);
  }
}
