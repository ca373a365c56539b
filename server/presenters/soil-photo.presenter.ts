// A stored soil photo as the API's SoilPhoto: the storage keys stay on the server; the client
// gets the URLs that serve the image and its thumbnail after the access check.
import type { SoilPhoto as SoilPhotoBody } from '../../shared/schemas/soils';
import type { SoilPhoto } from '../models';

export function presentPhoto(p: SoilPhoto): SoilPhotoBody {
  return {
    id: p.id,
    fieldId: p.fieldId,
    sampleId: p.sampleId,
    caption: p.caption,
    contentType: p.contentType,
    byteSize: p.byteSize,
    width: p.width,
    height: p.height,
    thumbnailWidth: p.thumbnailWidth,
    thumbnailHeight: p.thumbnailHeight,
    url: `/api/soil-photos/${p.id}/image`,
    thumbnailUrl: `/api/soil-photos/${p.id}/thumbnail`,
    createdAt: p.createdAt.toISOString(),
  };
}

export const presentPhotos = (photos: SoilPhoto[]): SoilPhotoBody[] => photos.map(presentPhoto);
