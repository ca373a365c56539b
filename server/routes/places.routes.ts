// GET /api/places?q=: places matching a name or an address, for any signed-in user (finding a
// farm is not tied to one). Typed coordinates never come here: the client reads them itself.
import { Router } from 'express';
import rateLimit from 'express-rate-limit';
import { PlaceSearchQuery } from '../../shared/schemas/places';
import { HttpError } from '../lib/http-error';
import { validateQuery } from '../middleware/validate';
import type { PlaceSearch } from '../services/places/place-search.service';
import { presentPlaces } from '../presenters/place.presenter';

/** Searches per person per minute: people type a name and press Enter, they do not stream. */
export const PLACE_SEARCHES_PER_MINUTE = 20;

const TRY_COORDINATES = 'Typed coordinates still work, e.g. 42.3071, -91.7770.';

export function placesRoutes(places: PlaceSearch): Router {
  const r = Router();
  const limit = rateLimit({
    windowMs: 60_000,
    limit: PLACE_SEARCHES_PER_MINUTE,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    keyGenerator: (req) => `user:${req.user!.id}`,
    handler: (_req, res) => {
      res.status(429).json({ error: 'too_many_requests', message: 'Too many place searches in a minute; wait a moment and try again.' });
    },
  });
  r.get('/', limit, validateQuery(PlaceSearchQuery), async (_req, res) => {
    const outcome = await places.search((res.locals.query as PlaceSearchQuery).q);
    if (outcome.ok) {
      res.json(presentPlaces(outcome.places));
      return;
    }
    if (outcome.reason !== 'off') console.warn(`Place search failed (${outcome.reason}): ${outcome.detail}`);
    if (outcome.reason === 'off') throw new HttpError(503, 'place_search_off', `Searching by name is not set up on this installation. ${TRY_COORDINATES}`);
    if (outcome.reason === 'unreachable') throw new HttpError(503, 'geocoder_unreachable', `The place search service could not be reached. ${TRY_COORDINATES}`);
    throw new HttpError(502, 'geocoder_failed', `The place search service gave an answer that could not be read. ${TRY_COORDINATES}`);
  });
  return r;
}
