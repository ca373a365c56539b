// Which geocoding service place search uses: GEOCODER_URL, or, when it is unset, the local fake
// started here (like the fake mail server), answering from the invented demo gazetteer.
import type { Config } from '../../config';
import { startFakeGeocoder, type FakeGeocoder } from './fake-geocoder-server';

export type GeocoderService = { url: string; fake: FakeGeocoder | null; close: () => Promise<void> };

export async function openGeocoderService(config: Pick<Config, 'geocoderUrl'>): Promise<GeocoderService> {
  if (config.geocoderUrl) return { url: config.geocoderUrl, fake: null, close: async () => undefined };
  const fake = await startFakeGeocoder();
  return { url: fake.url, fake, close: fake.close };
}
