// The scan field: a hand scanner types into it and ends with Enter; a person may type; or the camera reads the barcode.
import { ChangeDetectionStrategy, Component, ElementRef, inject, input, output, viewChild } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialog } from '@angular/material/dialog';
import { MatFormFieldModule } from '@angular/material/form-field';
import { MatIconModule } from '@angular/material/icon';
import { MatInputModule } from '@angular/material/input';
import { CameraScanDialog } from './camera-scan-dialog';

@Component({
  selector: 'vy-lot-scanner',
  imports: [MatFormFieldModule, MatInputModule, MatButtonModule, MatIconModule],
  template: `
    <div class="scanner">
      <mat-form-field class="field">
        <mat-label>Scan a carton’s barcode</mat-label>
        <mat-icon matPrefix aria-hidden="true">barcode_scanner</mat-icon>
        <input #field matInput autocomplete="off" autocapitalize="off" spellcheck="false" enterkeyhint="done"
               (keydown.enter)="submit($event)" (keydown)="groupSeparator($event)" />
        <mat-hint id="scan-hint">Hand scanner, camera, or typed: (01)…(17)…(10)…</mat-hint>
      </mat-form-field>
      <button mat-stroked-button type="button" class="camera" (click)="openCamera()">
        <mat-icon>photo_camera</mat-icon>Camera
      </button>
    </div>
    @if (message(); as text) {
      <p class="message" role="alert">{{ text }}</p>
    }
  `,
  styles: `
    .scanner { display: flex; gap: 8px; align-items: flex-start; }
    .field { flex: 1; }
    .camera { min-height: 56px; }
    .message { margin: 4px 0 0; padding: 8px 12px; border-radius: 8px; background: var(--vy-warn-container); color: var(--vy-on-warn-container); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LotScanner {
  private readonly dialog = inject(MatDialog);
  readonly message = input<string | null>(null);
  readonly scanned = output<string>();
  private readonly field = viewChild.required<ElementRef<HTMLInputElement>>('field');

  focus(): void {
    this.field().nativeElement.focus();
  }

  protected submit(event: Event): void {
    // Enter ends a scan; it must not send the whole form.
    event.preventDefault();
    const element = this.field().nativeElement;
    const text = element.value;
    element.value = '';
    if (text.trim()) this.scanned.emit(text);
  }

  /** Keyboard-wedge scanners often send the GS1 separator (ASCII 29) as Ctrl+]; keep it in the data. */
  protected groupSeparator(event: KeyboardEvent): void {
    if (!(event.ctrlKey && (event.key === ']' || event.code === 'BracketRight'))) return;
    event.preventDefault();
    const element = this.field().nativeElement;
    const at = element.selectionStart ?? element.value.length;
    element.value = `${element.value.slice(0, at)}\u001d${element.value.slice(element.selectionEnd ?? at)}`;
    element.setSelectionRange(at + 1, at + 1);
  }

  protected openCamera(): void {
    this.dialog
      .open(CameraScanDialog, { width: '520px', maxWidth: '95vw' })
      .afterClosed()
      .subscribe((text: string | undefined) => {
        if (text) this.scanned.emit(text);
        this.focus();
      });
  }
}
