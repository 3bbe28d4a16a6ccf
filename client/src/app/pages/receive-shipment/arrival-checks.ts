// The checks at the door, each unanswered until answered, with one control that answers them all "fine".
import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { ReactiveFormsModule, type FormControl, type FormGroup } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatButtonToggleModule } from '@angular/material/button-toggle';
import { MatIconModule } from '@angular/material/icon';
import type { IndicatorState } from '@shared/receiving/arrival-checks.js';

export type ChecksGroup = FormGroup<{
  containerIntact: FormControl<boolean | null>;
  coolantPresent: FormControl<boolean | null>;
  indicator: FormControl<IndicatorState | null>;
  contentsCold: FormControl<boolean | null>;
}>;

@Component({
  selector: 'vy-arrival-checks',
  imports: [ReactiveFormsModule, MatButtonToggleModule, MatButtonModule, MatIconModule],
  template: `
    <button mat-flat-button type="button" class="all-fine" (click)="allFine.emit()">
      <mat-icon>done_all</mat-icon>All checks fine
    </button>
    <div [formGroup]="group()" class="checks">
      @for (check of yesNoChecks; track check.name) {
        <div class="check" [class.unanswered]="group().controls[check.name].value === null" [class.problem]="group().controls[check.name].value === false">
          <span class="question" [id]="check.name + '-label'">{{ check.question }}</span>
          <mat-button-toggle-group [formControlName]="check.name" [attr.aria-labelledby]="check.name + '-label'">
            <mat-button-toggle [value]="true">Yes</mat-button-toggle>
            <mat-button-toggle [value]="false">No</mat-button-toggle>
          </mat-button-toggle-group>
          @if (showErrors() && group().controls[check.name].value === null) {
            <span class="error" role="alert">Answer this check.</span>
          }
        </div>
      }
      <div class="check" [class.unanswered]="group().controls.indicator.value === null" [class.problem]="group().controls.indicator.value === 'triggered'">
        <span class="question" id="indicator-label">Temperature indicator</span>
        <mat-button-toggle-group formControlName="indicator" aria-labelledby="indicator-label" class="three">
          <mat-button-toggle value="none">None in box</mat-button-toggle>
          <mat-button-toggle value="not_triggered">Not triggered</mat-button-toggle>
          <mat-button-toggle value="triggered">Triggered</mat-button-toggle>
        </mat-button-toggle-group>
        @if (showErrors() && group().controls.indicator.value === null) {
          <span class="error" role="alert">Answer this check.</span>
        }
      </div>
    </div>
  `,
  styleUrl: './arrival-checks.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ArrivalChecks {
  readonly group = input.required<ChecksGroup>();
  readonly showErrors = input(false);
  readonly allFine = output<void>();
  protected readonly yesNoChecks = [
    { name: 'containerIntact', question: 'Outer container intact' },
    { name: 'coolantPresent', question: 'Coolant present' },
    { name: 'contentsCold', question: 'Contents cold to the touch' },
  ] as const;
}
