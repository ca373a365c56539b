// Place search answers: positions to 7 decimals of a degree (about 1 cm), which is more than any
// geocoder's own accuracy and keeps long binary fractions out of the answer.
import type { Place, PlaceSearchResult } from '../../shared/schemas/places';

const round7 = (x: number) => Math.round(x * 1e7) / 1e7;

export function presentPlaces(places: Place[]): PlaceSearchResult {
  return { places: places.map((p) => ({ name: p.name, detail: p.detail, position: [round7(p.position[0]), round7(p.position[1])] })) };
}
