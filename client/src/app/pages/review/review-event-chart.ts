// The fridge chart around one review event: 12 hours either side, the event shaded, the product's range as the band.
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { ExposureEventView } from '@shared/lots/exposure-event-view.js';
import { FridgeChart, type ChartBand, type ChartExcursion } from '../fridge/fridge-chart';

const HOUR = 3_600_000;
/** Enough either side to see how the fridge behaved before and how it recovered after. */
export const EVENT_CHART_MARGIN_MS = 12 * HOUR;

/** From 12 h before the event starts to 12 h after it ends (never past now, always at least an hour past its end). */
export function eventChartWindow(start: string, end: string, now = Date.now()): { from: string; to: string } {
  const from = Date.parse(start) - EVENT_CHART_MARGIN_MS;
  const endAt = Date.parse(end);
  const to = Math.max(Math.min(endAt + EVENT_CHART_MARGIN_MS, now), endAt + HOUR);
  return { from: new Date(from).toISOString(), to: new Date(to).toISOString() };
}

/** The range the lots were judged by; a freeze event is judged at 0 °C, so its chart keeps the fridge's alarm range. */
export function eventChartBand(event: Pick<ExposureEventView, 'cause' | 'lowC' | 'highC' | 'fridgeLowC' | 'fridgeHighC'>): ChartBand {
  return event.cause === 'freeze'
    ? { lowC: event.fridgeLowC, highC: event.fridgeHighC, label: 'Fridge alarm range' }
    : { lowC: event.lowC, highC: event.highC, label: 'Product range' };
}

@Component({
  selector: 'vy-review-event-chart',
  imports: [FridgeChart],
  template: `
    <vy-fridge-chart [fridgeId]="event().fridgeId" [timeZone]="timeZone()" [window]="window()" [band]="band()" [excursions]="excursions()"
                     [heading]="'Fridge chart around the event, ' + event().fridgeName" [headingLevel]="3" />
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReviewEventChart {
  readonly event = input.required<ExposureEventView>();
  /** The fridge's site's zone: the chart's times are on its clock. */
  readonly timeZone = input<string | null>(null);
  protected readonly window = computed(() => eventChartWindow(this.event().start, this.event().end));
  protected readonly band = computed(() => eventChartBand(this.event()));
  protected readonly excursions = computed<ChartExcursion[]>(() => [{ start: this.event().start, end: this.event().end }]);
}
