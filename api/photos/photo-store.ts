// Keeps photo files under UPLOADS_DIR/photos with generated names, written before the rows that point at them.
import { randomUUID } from 'node:crypto';
import { mkdir, rm, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import type { ProcessedPhoto } from './process-photo.js';

export type PhotoSize = 'display' | 'thumb';

export interface StoredPhoto extends ProcessedPhoto {
  fileKey: string;
}

const uuid = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/;

export class PhotoStore {
  private readonly folder: string;

  constructor(uploadsDir: string) {
    this.folder = join(uploadsDir, 'photos');
  }

  pathOf(fileKey: string, size: PhotoSize): string {
    // Keys come from our own rows; the check keeps any other text from becoming a path.
    if (!uuid.test(fileKey)) throw new Error(`not a photo key: ${fileKey}`);
    return join(this.folder, size === 'display' ? `${fileKey}.jpg` : `${fileKey}.thumb.jpg`);
  }

  async write(photos: ProcessedPhoto[]): Promise<StoredPhoto[]> {
    await mkdir(this.folder, { recursive: true });
    const stored: StoredPhoto[] = [];
    try {
      for (const photo of photos) {
        const entry = { ...photo, fileKey: randomUUID() };
        stored.push(entry);
        await writeFile(this.pathOf(entry.fileKey, 'display'), photo.display, { flag: 'wx' });
        await writeFile(this.pathOf(entry.fileKey, 'thumb'), photo.thumb, { flag: 'wx' });
      }
      return stored;
    } catch (error) {
      await this.remove(stored.map((s) => s.fileKey));
      throw error;
    }
  }

  async remove(fileKeys: string[]): Promise<void> {
    await Promise.all(fileKeys.flatMap((key) => (['display', 'thumb'] as const).map((size) => rm(this.pathOf(key, size), { force: true }))));
  }

  /**
   * Writes the files, then runs the database work; when that fails the files go too, so no row ever points at a
   * missing file and no file is left for a row that was never written.
   */
  async withFiles<T>(photos: ProcessedPhoto[], work: (stored: StoredPhoto[]) => Promise<T>): Promise<T> {
    const stored = await this.write(photos);
    try {
      return await work(stored);
    } catch (error) {
      await this.remove(stored.map((s) => s.fileKey));
      throw error;
    }
  }
}
