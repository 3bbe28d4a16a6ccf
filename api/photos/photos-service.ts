// Finds a shipment photo and the site it belongs to, for serving it only to people of that site.
import { Shipment, ShipmentPhoto } from '../../database/models/index.js';
import type { ShipmentPhotoView } from '../../shared/receiving/shipment-view.js';
import { AppError } from '../http/app-error.js';

export async function siteOfPhoto(photoId: number): Promise<number | null> {
  const photo = await ShipmentPhoto.findByPk(photoId, { attributes: ['shipmentId'] });
  if (!photo) return null;
  return (await Shipment.findByPk(photo.shipmentId, { attributes: ['siteId'] }))?.siteId ?? null;
}

export async function findPhoto(photoId: number): Promise<ShipmentPhoto> {
  const photo = await ShipmentPhoto.findByPk(photoId);
  if (!photo) throw AppError.notFound('No such photo.');
  return photo;
}

export function toPhotoView(photo: ShipmentPhoto): ShipmentPhotoView {
  return { id: photo.id, width: photo.width, height: photo.height, displayUrl: `/api/photos/${photo.id}/display`, thumbUrl: `/api/photos/${photo.id}/thumb` };
}
