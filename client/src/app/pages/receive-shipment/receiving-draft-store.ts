// The shipment being received, kept on the phone as it is filled in: the form in localStorage, the photos in IndexedDB.
import { Injectable, inject } from '@angular/core';
import { AuthStore } from '../../core/auth/auth-store';
import type { ShipmentFormValue } from './shipment-form';
import { deleteDraftPhotos, readDraftPhotos, writeDraftPhotos, type DraftPhoto } from './draft-photo-db';

export interface ReceivingDraft {
  clientKey: string;
  siteId: number;
  orderId: number | null;
  value: ShipmentFormValue;
  photoCount: number;
  savedAt: string;
  summary: string;
  params: { site: number; order?: number };
}

@Injectable({ providedIn: 'root' })
export class ReceivingDraftStore {
  private readonly auth = inject(AuthStore);

  private key(): string {
    return `vialyard.receiving-draft.v1.${this.auth.user()?.id ?? 'nobody'}`;
  }

  peek(): ReceivingDraft | null {
    try {
      return JSON.parse(localStorage.getItem(this.key()) ?? 'null') as ReceivingDraft | null;
    } catch {
      return null;
    }
  }

  save(draft: Omit<ReceivingDraft, 'savedAt' | 'summary' | 'params'>): void {
    const lots = draft.value.lines.length;
    const summary = `${lots} lot${lots === 1 ? '' : 's'}, ${draft.photoCount} photo${draft.photoCount === 1 ? '' : 's'}`;
    const params = draft.orderId === null ? { site: draft.siteId } : { site: draft.siteId, order: draft.orderId };
    localStorage.setItem(this.key(), JSON.stringify({ ...draft, savedAt: new Date().toISOString(), summary, params }));
  }

  photos(clientKey: string): Promise<DraftPhoto[]> {
    return readDraftPhotos(clientKey);
  }

  savePhotos(clientKey: string, photos: DraftPhoto[]): Promise<void> {
    return writeDraftPhotos(clientKey, photos);
  }

  async discard(): Promise<void> {
    const draft = this.peek();
    localStorage.removeItem(this.key());
    if (draft) await deleteDraftPhotos(draft.clientKey);
  }
}
