// The checks made at the door on each shipment, and the words the form and the report use for them.
export const indicatorStates = ['none', 'not_triggered', 'triggered'] as const;
export type IndicatorState = (typeof indicatorStates)[number];

export const indicatorLabels: Record<IndicatorState, string> = {
  none: 'No indicator in the box',
  not_triggered: 'Indicator not triggered',
  triggered: 'Indicator triggered',
};

export const readingPlaces = ['product_surface', 'probe', 'shipping_monitor'] as const;
export type ReadingPlace = (typeof readingPlaces)[number];

export const readingPlaceLabels: Record<ReadingPlace, string> = {
  product_surface: 'Product surface',
  probe: 'Probe',
  shipping_monitor: 'Shipping monitor in the box',
};

export interface ArrivalChecks {
  containerIntact: boolean;
  coolantPresent: boolean;
  indicator: IndicatorState;
  contentsCold: boolean;
}

/** What one "all checks fine" answer stands for. */
export const allChecksFine: ArrivalChecks = Object.freeze({
  containerIntact: true,
  coolantPresent: true,
  indicator: 'not_triggered',
  contentsCold: true,
});

export const outcomes = ['accepted', 'accepted_with_discrepancies', 'refused'] as const;
export type ShipmentOutcome = (typeof outcomes)[number];

export const outcomeLabels: Record<ShipmentOutcome, string> = {
  accepted: 'Accepted',
  accepted_with_discrepancies: 'Accepted with discrepancies',
  refused: 'Refused',
};
