// Serves shipment photos (display size and thumbnail) to signed-in users who may see the shipment's site.
import { existsSync } from 'node:fs';
import type { AppContext } from '../app-context.js';
import { AppError } from '../http/app-error.js';
import { createSecureRouter } from '../http/secure-router.js';
import { parseIdParam } from '../http/params.js';
import { PhotoStore, type PhotoSize } from './photo-store.js';
import { findPhoto, siteOfPhoto } from './photos-service.js';

export const shipmentReaders = ['admin', 'receiving', 'storage', 'purchasing', 'veterinarian'] as const;

export function photosRoutes(context: AppContext) {
  const router = createSecureRouter('/api/photos');
  const store = new PhotoStore(context.config.UPLOADS_DIR);
  const access = { roles: shipmentReaders, siteOf: async (req: { params: Record<string, string | string[]> }) => siteOfPhoto(parseIdParam(req.params.photoId)) };

  for (const size of ['display', 'thumb'] as PhotoSize[]) {
    router.get(`/:photoId/${size}`, access, async (req, res, next) => {
      const photo = await findPhoto(parseIdParam(req.params.photoId));
      const path = store.pathOf(photo.fileKey, size);
      if (!existsSync(path)) throw AppError.notFound('The photo file is missing.');
      // The path is our own (UPLOADS_DIR may sit under a dot-folder such as .runtime).
      const options = { dotfiles: 'allow' as const, headers: { 'Content-Type': 'image/jpeg', 'Cache-Control': 'private, max-age=86400' } };
      res.sendFile(path, options, (error) => {
        if (error && !res.headersSent) next(AppError.notFound('The photo file could not be read.'));
      });
    });
  }

  return router;
}
