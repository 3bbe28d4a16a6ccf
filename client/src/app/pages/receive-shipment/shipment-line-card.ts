// One lot on the receiving form: what it is, its counts (intact follows the others until typed), acceptance and storage.
import { ChangeDetectionStrategy, Component, DestroyRef, OnInit, inject, input, output, viewChild } from '@angular/core';
import { takeUntilDestroyed } from '@angular/core/rxjs-interop';
import { type AbstractControl, ReactiveFormsModule } from '@angular/forms';
import type { ErrorStateMatcher } from '@angular/material/core';
import { MatButtonModule } from '@angular/material/button';
import { MatExpansionModule } from '@angular/material/expansion';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { MatSelect, MatSelectModule } from '@angular/material/select';
import { MatSlideToggleModule } from '@angular/material/slide-toggle';
import { merge } from 'rxjs';
import { controlMessage } from '../../core/forms/server-errors';
import { siteClockHint } from '../../shared/sites/site-clock-hint';
import type { LineGroup } from './shipment-form';

export interface PresentationChoice {
  id: number;
  label: string;
  proposed: boolean;
}

@Component({
  selector: 'vy-shipment-line-card',
  imports: [ReactiveFormsModule, MatFormFieldModule, MatInputModule, MatSelectModule, MatSlideToggleModule, MatButtonModule, MatIconModule, MatExpansionModule],
  templateUrl: './shipment-line-card.html',
  styleUrl: './shipment-line-card.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ShipmentLineCard implements OnInit {
  private readonly destroyRef = inject(DestroyRef);
  readonly group = input.required<LineGroup>();
  readonly index = input.required<number>();
  readonly presentations = input.required<PresentationChoice[]>();
  readonly fridges = input.required<{ id: number; code: string; name: string }[]>();
  readonly refused = input(false);
  /** True once the form was sent: every field shows what is missing. */
  readonly showErrors = input(false);
  /** The site's zone, whose clock "Went in at" is typed on. */
  readonly timeZone = input<string | null>(null);
  readonly removed = output<void>();
  protected readonly message = controlMessage;
  /**
   * A field shows its error once the person changed it or sent the form. Touched alone is not enough: "Add a lot by
   * hand" focuses the product field, and the focus leaving it would mark "Required." before any answer. (The card's
   * own [formGroup] is never submitted, so "sent" comes from the form above.)
   */
  protected readonly errorMatcher: ErrorStateMatcher = {
    isErrorState: (control: AbstractControl | null) => !!control?.invalid && (control.dirty || this.showErrors()),
  };
  private readonly presentationSelect = viewChild.required<MatSelect>('presentation');
  protected readonly counts = [
    { name: 'vialsExpected', label: 'Expected' },
    { name: 'vialsIntact', label: 'Intact' },
    { name: 'vialsBroken', label: 'Broken or damaged' },
    { name: 'vialsMissing', label: 'Missing' },
  ] as const;

  ngOnInit(): void {
    const c = this.group().controls;
    // Intact = expected − broken − missing until the clerk types intact themselves.
    merge(c.vialsExpected.valueChanges, c.vialsBroken.valueChanges, c.vialsMissing.valueChanges)
      .pipe(takeUntilDestroyed(this.destroyRef))
      .subscribe(() => {
        if (!c.vialsIntact.dirty) c.vialsIntact.setValue(Math.max(0, (c.vialsExpected.value || 0) - (c.vialsBroken.value || 0) - (c.vialsMissing.value || 0)));
      });
  }

  /** Read on each check: typing in the field is an event of this card, so the zone's name follows the date typed. */
  protected storedHint(): string {
    return siteClockHint(this.group().controls.storedAt.value, this.timeZone());
  }

  /** A line added by hand starts at what it is: the product and pack. */
  focusFirstField(): void {
    this.presentationSelect().focus();
  }

  protected labelOf(id: number | null): string {
    return this.presentations().find((p) => p.id === id)?.label ?? 'Choose the product and pack';
  }

  protected isProposed(id: number | null): boolean {
    return this.presentations().find((p) => p.id === id)?.proposed ?? false;
  }
}
