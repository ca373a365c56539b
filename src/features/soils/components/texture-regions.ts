// The 12 USDA texture classes as polygons on the texture triangle, cut from the whole triangle
// by the SSM ch. 3 inequalities (the same rules as
// shared/erosion TEXTURE_RULES). Each class is one or two convex pieces; each piece is the
// triangle clipped by half-planes, so the outlines are exact straight lines.
import { TEXTURE_CLASSES, type Separates, type TextureClass } from '../../../../shared/erosion/texture';

/** a·sand + b·silt + c·clay + k ≥ 0 (strict or not makes no difference to a drawing). */
type HalfPlane = { sand?: number; silt?: number; clay?: number; k: number };

const at = (h: HalfPlane, p: Separates) => (h.sand ?? 0) * p.sand + (h.silt ?? 0) * p.silt + (h.clay ?? 0) * p.clay + h.k;

// Shorthands: x ≥ v and x < v for one fraction.
const atLeast = (key: keyof Separates, v: number): HalfPlane => ({ [key]: 1, k: -v });
const below = (key: keyof Separates, v: number): HalfPlane => ({ [key]: -1, k: v });

// SSM ch. 3 texture triangle, class by class.
export const TEXTURE_PIECES: Record<TextureClass, HalfPlane[][]> = {
  sand: [[{ silt: -1, clay: -1.5, k: 15 }]],
  'loamy sand': [[{ silt: 1, clay: 1.5, k: -15 }, { silt: -1, clay: -2, k: 30 }]],
  'sandy loam': [
    [atLeast('clay', 7), below('clay', 20), atLeast('sand', 52), { silt: 1, clay: 2, k: -30 }],
    [below('clay', 7), below('silt', 50), { silt: 1, clay: 2, k: -30 }],
  ],
  loam: [[atLeast('clay', 7), below('clay', 27), atLeast('silt', 28), below('silt', 50), below('sand', 52)]],
  'silt loam': [
    [atLeast('silt', 50), atLeast('clay', 12), below('clay', 27)],
    [atLeast('silt', 50), below('silt', 80), below('clay', 12)],
  ],
  silt: [[atLeast('silt', 80), below('clay', 12)]],
  'sandy clay loam': [[atLeast('clay', 20), below('clay', 35), below('silt', 28), atLeast('sand', 45)]],
  'clay loam': [[atLeast('clay', 27), below('clay', 40), atLeast('sand', 20), below('sand', 45)]],
  'silty clay loam': [[atLeast('clay', 27), below('clay', 40), below('sand', 20)]],
  'sandy clay': [[atLeast('clay', 35), atLeast('sand', 45)]],
  'silty clay': [[atLeast('clay', 40), atLeast('silt', 40)]],
  clay: [[atLeast('clay', 40), below('sand', 45), below('silt', 40)]],
};

const CORNERS: Separates[] = [
  { sand: 0, silt: 0, clay: 100 },
  { sand: 100, silt: 0, clay: 0 },
  { sand: 0, silt: 100, clay: 0 },
];

/** Sutherland–Hodgman: the part of a convex polygon where h ≥ 0. */
function clip(polygon: Separates[], h: HalfPlane): Separates[] {
  const out: Separates[] = [];
  polygon.forEach((p, i) => {
    const q = polygon[(i + 1) % polygon.length];
    const fp = at(h, p);
    const fq = at(h, q);
    if (fp >= 0) out.push(p);
    if ((fp >= 0) !== (fq >= 0)) {
      const t = fp / (fp - fq);
      out.push({ sand: p.sand + t * (q.sand - p.sand), silt: p.silt + t * (q.silt - p.silt), clay: p.clay + t * (q.clay - p.clay) });
    }
  });
  return out;
}

const area = (poly: Separates[]) =>
  Math.abs(poly.reduce((s, p, i) => {
    const q = poly[(i + 1) % poly.length];
    return s + p.sand * q.clay - q.sand * p.clay;
  }, 0)) / 2;

export type RegionLabel = { at: Separates; rotateDeg?: number; small?: boolean };
export type TextureRegion = { name: TextureClass; pieces: Separates[][]; label: RegionLabel };

/** Where a class name sits when the centre of its biggest piece is too tight for the words. */
const LABEL_AT: Partial<Record<TextureClass, RegionLabel>> = {
  sand: { at: { sand: 91, silt: 6, clay: 3 }, small: true },
  // Along the thin loamy-sand band, which runs at 30° to the sand axis, high enough that the
  // turned words stay clear of the bottom edge.
  'loamy sand': { at: { sand: 82, silt: 12, clay: 6 }, rotateDeg: 30, small: true },
  // A small region: the words sit in its widest part, clear of the 40 % clay line.
  'sandy clay': { at: { sand: 50, silt: 8, clay: 42 }, small: true },
  silt: { at: { sand: 7, silt: 88, clay: 5 } },
  'sandy loam': { at: { sand: 64, silt: 25, clay: 11 } },
};

function centroid(poly: Separates[]): Separates {
  const n = poly.length;
  return poly.reduce((c, p) => ({ sand: c.sand + p.sand / n, silt: c.silt + p.silt / n, clay: c.clay + p.clay / n }), { sand: 0, silt: 0, clay: 0 });
}

/** The 12 regions, in the engine's class order. */
export const TEXTURE_REGIONS: TextureRegion[] = TEXTURE_CLASSES.map((name) => {
  const pieces = TEXTURE_PIECES[name].map((planes) => planes.reduce(clip, CORNERS)).filter((p) => p.length >= 3 && area(p) > 1e-9);
  const biggest = [...pieces].sort((a, b) => area(b) - area(a))[0];
  return { name, pieces, label: LABEL_AT[name] ?? { at: centroid(biggest) } };
});
