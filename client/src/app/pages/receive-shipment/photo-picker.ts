// Photos for a shipment: from the phone's camera (capture) or from files, shown as thumbnails at once.
import { ChangeDetectionStrategy, Component, input, output } from '@angular/core';
import { MatButtonModule } from '@angular/material/button';
import { MatIconModule } from '@angular/material/icon';

export interface PickedPhoto {
  id: string;
  name: string;
  url: string;
}

@Component({
  selector: 'vy-photo-picker',
  imports: [MatButtonModule, MatIconModule],
  template: `
    <div class="actions">
      <button mat-flat-button type="button" class="big" (click)="camera.click()" [disabled]="photos().length >= max()">
        <mat-icon>photo_camera</mat-icon>Take a photo
      </button>
      <button mat-stroked-button type="button" class="big" (click)="files.click()" [disabled]="photos().length >= max()">
        <mat-icon>add_photo_alternate</mat-icon>Add from files
      </button>
      <!-- Opened by the buttons above; kept out of the tab order so each choice is one control. -->
      <input #camera type="file" accept="image/*" capture="environment" class="vy-visually-hidden" tabindex="-1" aria-hidden="true" aria-label="Camera" (change)="pick($event)" />
      <input #files type="file" accept="image/*" multiple class="vy-visually-hidden" tabindex="-1" aria-hidden="true" aria-label="Photo files" (change)="pick($event)" />
    </div>
    @if (photos().length) {
      <ul class="thumbs" aria-label="Photos of this shipment">
        @for (photo of photos(); track photo.id; let i = $index) {
          <li>
            <img [src]="photo.url" [alt]="'Photo ' + (i + 1) + ': ' + photo.name" />
            <button mat-icon-button type="button" class="remove" (click)="removed.emit(photo.id)" [attr.aria-label]="'Remove photo ' + (i + 1)">
              <mat-icon>close</mat-icon>
            </button>
          </li>
        }
      </ul>
    } @else {
      <p class="hint">Photograph the outer box, and any damage, before opening it further.</p>
    }
  `,
  styles: `
    .actions { display: flex; flex-wrap: wrap; gap: 8px; }
    .big { min-height: 52px; flex: 1 1 160px; }
    .thumbs { list-style: none; padding: 0; margin: 12px 0 0; display: grid; grid-template-columns: repeat(auto-fill, minmax(96px, 1fr)); gap: 8px; }
    .thumbs li { position: relative; }
    img { width: 100%; aspect-ratio: 1; object-fit: cover; border-radius: 8px; display: block; background: var(--mat-sys-surface-container); }
    .remove { position: absolute; top: 2px; right: 2px; background: var(--mat-sys-surface); }
    .hint { color: var(--mat-sys-on-surface-variant); margin: 8px 0 0; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class PhotoPicker {
  readonly photos = input.required<PickedPhoto[]>();
  readonly max = input(8);
  readonly added = output<File[]>();
  readonly removed = output<string>();

  protected pick(event: Event): void {
    const element = event.target as HTMLInputElement;
    const chosen = [...(element.files ?? [])];
    element.value = '';
    if (chosen.length) this.added.emit(chosen);
  }
}
