// The receiving form's typed controls, and how its value becomes what the API receives.
// Its times are typed on the site's clock ("2026-12-02T09:15" at the farm), whatever zone the phone is set to.
import { FormArray, FormControl, FormGroup, NonNullableFormBuilder, Validators } from '@angular/forms';
import type { IndicatorState, ReadingPlace, ShipmentOutcome } from '@shared/receiving/arrival-checks.js';
import { siteWallTimeToInstant } from '@shared/sites/site-clock.js';
import type { TemperatureUnit } from '@shared/temperature/index.js';

export interface LineControls {
  presentationId: FormControl<number | null>;
  scan: FormControl<string>;
  lotNumber: FormControl<string>;
  expiry: FormControl<string>;
  vialsExpected: FormControl<number>;
  vialsIntact: FormControl<number>;
  vialsBroken: FormControl<number>;
  vialsMissing: FormControl<number>;
  accepted: FormControl<boolean>;
  /** Null: the fridge chosen for the whole shipment. */
  fridgeId: FormControl<number | null>;
  /** Empty: the time chosen for the whole shipment. */
  storedAt: FormControl<string>;
}

export type LineGroup = FormGroup<LineControls>;
export type LineValue = ReturnType<LineGroup['getRawValue']>;

export function lineGroup(fb: NonNullableFormBuilder, value: Partial<LineValue> = {}): LineGroup {
  const count = (n = 0) => fb.control(n, [Validators.required, Validators.min(0)]);
  return fb.group<LineControls>({
    presentationId: fb.control<number | null>(value.presentationId ?? null, Validators.required),
    scan: fb.control(value.scan ?? ''),
    lotNumber: fb.control(value.lotNumber ?? '', [Validators.required, Validators.maxLength(20)]),
    expiry: fb.control(value.expiry ?? '', [Validators.required, Validators.pattern(/^\d{4}-\d{2}(-\d{2})?$/)]),
    vialsExpected: count(value.vialsExpected),
    vialsIntact: count(value.vialsIntact ?? value.vialsExpected),
    vialsBroken: count(value.vialsBroken),
    vialsMissing: count(value.vialsMissing),
    accepted: fb.control(value.accepted ?? true),
    fridgeId: fb.control<number | null>(value.fridgeId ?? null),
    storedAt: fb.control(value.storedAt ?? ''),
  });
}

export function createShipmentForm(fb: NonNullableFormBuilder, unit: TemperatureUnit) {
  return fb.group({
    purchaseOrderId: fb.control<number | null>(null),
    supplierId: fb.control<number | null>(null),
    carrier: fb.control('', Validators.maxLength(80)),
    trackingNumber: fb.control('', Validators.maxLength(80)),
    /** Set to now on the site's clock once the site is known (or from the draft). */
    arrivedAt: fb.control('', Validators.required),
    shippedAt: fb.control(''),
    checks: fb.group({
      containerIntact: fb.control<boolean | null>(null, Validators.required),
      coolantPresent: fb.control<boolean | null>(null, Validators.required),
      indicator: fb.control<IndicatorState | null>(null, Validators.required),
      contentsCold: fb.control<boolean | null>(null, Validators.required),
    }),
    readingValue: fb.control<number | null>(null),
    readingUnit: fb.control<TemperatureUnit>(unit),
    readingPlace: fb.control<ReadingPlace | null>(null),
    fridgeId: fb.control<number | null>(null),
    storedAt: fb.control(''),
    /** Null: the outcome the findings suggest. */
    outcome: fb.control<ShipmentOutcome | null>(null),
    notes: fb.control('', Validators.maxLength(2000)),
    lines: fb.array<LineGroup>([]),
  });
}

export type ShipmentForm = ReturnType<typeof createShipmentForm>;
export type ShipmentFormValue = ReturnType<ShipmentForm['getRawValue']>;

/** A datetime field's value read on the site's clock, as the instant the API takes; null when empty (or unreadable). */
export function siteInstant(wall: string, timeZone: string): string | null {
  return wall ? (siteWallTimeToInstant(wall, timeZone)?.toISOString() ?? null) : null;
}

/** The body the API's shipment schema reads; the server checks it all again. */
export function toShipmentBody(value: ShipmentFormValue, clientKey: string, outcome: ShipmentOutcome, timeZone: string) {
  const instant = (wall: string) => siteInstant(wall, timeZone);
  return {
    clientKey,
    purchaseOrderId: value.purchaseOrderId,
    supplierId: value.supplierId,
    carrier: value.carrier,
    trackingNumber: value.trackingNumber,
    arrivedAt: instant(value.arrivedAt),
    shippedAt: instant(value.shippedAt),
    checks: value.checks,
    reading: value.readingValue === null ? null : { value: value.readingValue, unit: value.readingUnit, place: value.readingPlace },
    outcome,
    notes: value.notes,
    lines: value.lines.map((line) => ({
      presentationId: line.presentationId,
      scan: line.scan,
      lotNumber: line.lotNumber,
      expiry: line.expiry,
      vialsExpected: line.vialsExpected,
      vialsIntact: line.vialsIntact,
      vialsBroken: line.vialsBroken,
      vialsMissing: line.vialsMissing,
      accepted: outcome !== 'refused' && line.accepted,
      fridgeId: line.fridgeId ?? value.fridgeId,
      storedAt: instant(line.storedAt || value.storedAt),
    })),
  };
}

export function linesArray(form: ShipmentForm): FormArray<LineGroup> {
  return form.controls.lines;
}
