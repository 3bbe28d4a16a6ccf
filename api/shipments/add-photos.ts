// Adds photos to a shipment already recorded (damage found while unpacking): files first, rows in one transaction.
import { Shipment, ShipmentPhoto } from '../../database/models/index.js';
import type { ShipmentView } from '../../shared/receiving/shipment-view.js';
import type { AppContext } from '../app-context.js';
import { recordAudit } from '../audit/record-audit.js';
import { AppError } from '../http/app-error.js';
import { photoLimits } from '../photos/photo-limits.js';
import { PhotoStore } from '../photos/photo-store.js';
import type { ProcessedPhoto } from '../photos/process-photo.js';
import { loadShipmentView } from './shipment-views.js';

export async function addShipmentPhotos(context: AppContext, actorId: number, shipmentId: number, photos: ProcessedPhoto[]): Promise<ShipmentView> {
  if (!photos.length) throw AppError.badRequest('Choose at least one photo.', [{ field: 'photos', message: 'No photo sent.' }]);
  const store = new PhotoStore(context.config.UPLOADS_DIR);
  await store.withFiles(photos, (stored) =>
    context.sequelize.transaction(async (transaction) => {
      const shipment = await Shipment.findByPk(shipmentId, { transaction, lock: transaction.LOCK.UPDATE });
      if (!shipment) throw AppError.notFound('No such shipment.');
      const count = await ShipmentPhoto.count({ where: { shipmentId }, transaction });
      if (count + stored.length > photoLimits.maxPerShipment) {
        throw new AppError(413, 'too_large', `A shipment keeps at most ${photoLimits.maxPerShipment} photos.`, [{ field: 'photos', message: 'Too many photos for this shipment.' }]);
      }
      await ShipmentPhoto.bulkCreate(
        stored.map((p) => ({ shipmentId, fileKey: p.fileKey, width: p.width, height: p.height, bytes: p.display.length, originalName: p.originalName, uploadedBy: actorId })),
        { transaction },
      );
      await recordAudit({ actorId, action: 'shipment.photos', entity: 'shipment', entityId: shipmentId, after: { photos: stored.map((p) => p.fileKey) } }, transaction);
    }),
  );
  return loadShipmentView(shipmentId);
}
