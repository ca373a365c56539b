// One field's terrain figures, or why there are none yet: a run is on its way (the client asks
// again shortly), or no elevation model covers the field (the client asks for a typed slope).
import { FieldTerrain, ProcessingJob } from '../models';
import { HttpError } from '../lib/http-error';

export async function fieldTerrain(field: { id: number; farmId: number }): Promise<FieldTerrain> {
  const figures = await FieldTerrain.withFieldVersion(field.id);
  if (figures) return figures;
  if (await ProcessingJob.pendingForFarm(field.farmId, 'terrain')) {
    throw new HttpError(404, 'terrain_pending', 'The terrain figures of this field are being worked out; they will be here in a moment.');
  }
  throw new HttpError(404, 'no_terrain', 'No elevation model covers this field yet: upload one for the farm, or type the slope % and slope length.');
}
