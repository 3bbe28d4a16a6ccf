// Reads a carton's barcode with the phone's camera (ZXing): GS1 DataMatrix, GS1-128 and QR codes.
import { ChangeDetectionStrategy, Component, ElementRef, inject, signal, viewChild, type AfterViewInit, type OnDestroy } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatDialogModule, MatDialogRef } from '@angular/material/dialog';
import { BrowserMultiFormatReader, type IScannerControls } from '@zxing/browser';
import { BarcodeFormat, DecodeHintType } from '@zxing/library';

@Component({
  selector: 'vy-camera-scan-dialog',
  imports: [MatDialogModule, MatButtonModule],
  template: `
    <h2 mat-dialog-title>Scan with the camera</h2>
    <mat-dialog-content>
      <video #video class="video" muted playsinline aria-label="Camera view"></video>
      <p role="status">{{ status() }}</p>
    </mat-dialog-content>
    <mat-dialog-actions align="end">
      <button mat-button type="button" mat-dialog-close>Close</button>
    </mat-dialog-actions>
  `,
  styles: `.video { width: 100%; max-height: 60vh; background: #000; border-radius: 8px; } p { margin: 8px 0 0; }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CameraScanDialog implements AfterViewInit, OnDestroy {
  private readonly dialogRef = inject(MatDialogRef<CameraScanDialog, string>);
  private readonly video = viewChild.required<ElementRef<HTMLVideoElement>>('video');
  private controls: IScannerControls | undefined;
  protected readonly status = signal('Starting the camera…');

  async ngAfterViewInit(): Promise<void> {
    const hints = new Map<DecodeHintType, unknown>([
      [DecodeHintType.POSSIBLE_FORMATS, [BarcodeFormat.DATA_MATRIX, BarcodeFormat.CODE_128, BarcodeFormat.QR_CODE]],
      // GS1 barcodes start with FNC1; ZXing then reports the separators as ASCII 29, which the parser reads.
      [DecodeHintType.ASSUME_GS1, true],
    ]);
    try {
      const reader = new BrowserMultiFormatReader(hints);
      this.controls = await reader.decodeFromVideoDevice(undefined, this.video().nativeElement, (result) => {
        if (result) {
          this.controls?.stop();
          this.dialogRef.close(result.getText());
        }
      });
      this.status.set('Hold the carton’s barcode in the frame.');
    } catch {
      this.status.set('No camera is available here. Use a hand scanner, or type the barcode into the field.');
    }
  }

  ngOnDestroy(): void {
    this.controls?.stop();
  }
}
