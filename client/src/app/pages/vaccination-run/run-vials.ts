// Vials out: scan (camera or hand scanner) or type each lot; Vialyard refuses held, expired or wrong-product lots and says why.
import { ChangeDetectionStrategy, Component, inject, viewChild } from '@angular/core';
import { FormGroupDirective, NonNullableFormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { firstValueFrom } from 'rxjs';
import { CameraScanDialog } from '../receive-shipment/camera-scan-dialog';
import { RunStep } from './run-step';

@Component({
  selector: 'vy-run-vials',
  imports: [ReactiveFormsModule, MatButtonModule, MatFormFieldModule, MatInputModule, MatIconModule],
  template: `
    <section aria-labelledby="vials-title">
      <h2 id="vials-title">3. Vials out</h2>
      @if (run().lotsToTake.length) {
        <p>Take:</p>
        <ul class="plain">
          @for (l of run().lotsToTake; track l.lotId) {
            <li>Lot {{ l.lotNumber }} (expiry {{ l.expiry }}): {{ l.vials }} vial{{ l.vials === 1 ? '' : 's' }}@for (f of l.fridges; track f.fridgeId) { · {{ f.fridgeName }}}</li>
          }
        </ul>
      }
      @for (a of run().awaited; track $index) {
        <p class="form-error">{{ a.doses }} doses are planned from {{ a.source }} {{ a.label }}, which is not in the site's fridges yet: receive it before taking vials.</p>
      }
      @if (run().lotsOut.length) {
        <p>Out of the fridge:</p>
        <ul class="plain">
          @for (l of run().lotsOut; track l.lotId) {
            <li>Lot {{ l.lotNumber }}: {{ l.issued }} issued, {{ l.returned }} returned</li>
          }
        </ul>
      }
      @if (run().status === 'confirmed' && run().startedAt) {
        <form [formGroup]="form" (ngSubmit)="save()" novalidate class="fields">
          @if (error(); as e) { <p class="form-error" role="alert">{{ e }}</p> }
          <div class="row">
            <mat-form-field class="wide"><mat-label>Scan or type the barcode</mat-label>
              <input matInput formControlName="barcode" autocomplete="off" />
              @if (form.controls.barcode.invalid) { <mat-error>{{ message(form.controls.barcode) }}</mat-error> }</mat-form-field>
            <button mat-icon-button type="button" (click)="camera()" aria-label="Scan with the camera"><mat-icon>photo_camera</mat-icon></button>
          </div>
          <mat-form-field><mat-label>Or the lot number</mat-label><input matInput formControlName="lotNumber" autocomplete="off" />
            @if (form.controls.lotNumber.invalid) { <mat-error>{{ message(form.controls.lotNumber) }}</mat-error> }</mat-form-field>
          <mat-form-field><mat-label>Vials</mat-label><input matInput type="number" inputmode="numeric" formControlName="vials" required />
            @if (form.controls.vials.invalid) { <mat-error>{{ message(form.controls.vials) }}</mat-error> }</mat-form-field>
          <div><button mat-flat-button type="submit" [disabled]="busy()">Take out</button></div>
        </form>
      } @else if (run().status === 'confirmed') {
        <p class="who">Vials come out once the checks pass and the vaccination starts.</p>
      }
    </section>
  `,
  styleUrl: './run-sections.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class RunVials extends RunStep {
  private readonly fb = inject(NonNullableFormBuilder);
  private readonly dialog = inject(MatDialog);
  private readonly formDirective = viewChild(FormGroupDirective);
  protected readonly form = this.fb.group({
    barcode: [''],
    lotNumber: [''],
    vials: this.fb.control<number | null>(null, [Validators.required, Validators.min(1)]),
  });

  protected async camera(): Promise<void> {
    const text = await firstValueFrom(this.dialog.open(CameraScanDialog, { width: '520px', maxWidth: '95vw' }).afterClosed());
    if (typeof text === 'string') this.form.controls.barcode.setValue(text);
  }

  protected async save(): Promise<void> {
    const v = this.form.getRawValue();
    const body = { vials: v.vials, ...(v.barcode.trim() && { barcode: v.barcode.trim() }), ...(!v.barcode.trim() && v.lotNumber.trim() && { lotNumber: v.lotNumber.trim() }) };
    // resetForm also clears the submitted state, so the emptied fields show no error.
    if (await this.send('issues', body, this.form)) this.formDirective()?.resetForm({ barcode: '', lotNumber: '', vials: null });
  }
}
