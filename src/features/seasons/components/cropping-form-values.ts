// The cropping form's values and how they become the shared CroppingUpdate. The form keeps the
// cover crop's boxes while "cover crop" is off, and the residue while a grass crop is picked,
// so switching back loses nothing; toCroppingUpdate() sends only what applies. Validation is
// the shared schema run on that payload, so its paths (tillage, coverCrop.species, …) are the
// form's own names and the errors land beside the inputs.
import { zodResolver } from '@hookform/resolvers/zod';
import type { Resolver } from 'react-hook-form';
import type { z } from 'zod';
import type { StripRotation } from '../../../../shared/erosion';
import { Crop, Practice, Tillage } from '../../../../shared/schemas/estimate';
import { CroppingUpdate, type Cropping } from '../../../../shared/schemas/season';

export type CropName = z.infer<typeof Crop>;
export type TillageName = z.infer<typeof Tillage>;
export type PracticeName = z.infer<typeof Practice>;

export const CROPS = Crop.options;
export const TILLAGES = Tillage.options;
export const PRACTICES = Practice.options;

export const PRACTICE_LABELS: Record<PracticeName, string> = {
  none: 'None (up and down the slope)',
  contouring: 'Contour farming',
  'strip cropping': 'Strip cropping on the contour',
  terraces: 'Terraces',
};

/** Grass crops: no tillage, ground cover instead of residue. */
export const isGrass = (crop: CropName) => crop === 'pasture' || crop === 'hay or meadow';

export type CroppingFormValues = {
  crop: CropName;
  tillage: TillageName | '';
  residuePct: number | null;
  groundCoverPct: number | null;
  hasCoverCrop: boolean;
  coverCrop: { species: string; seededOn: string; terminatedOn: string };
  practice: PracticeName;
  terraceIntervalM: number | null;
  stripRotation: StripRotation | '';
  stripWidthM: number | null;
};

export type CroppingPayload = z.output<typeof CroppingUpdate>;

export function formValuesOf(c: Cropping | null): CroppingFormValues {
  return {
    crop: c?.crop ?? 'corn',
    tillage: c?.tillage ?? (c && isGrass(c.crop) ? '' : 'chisel or mulch-till'),
    residuePct: c?.residuePct ?? null,
    groundCoverPct: c?.groundCoverPct ?? null,
    hasCoverCrop: Boolean(c?.coverCrop),
    coverCrop: {
      species: c?.coverCrop?.species ?? '',
      seededOn: c?.coverCrop?.seededOn ?? '',
      terminatedOn: c?.coverCrop?.terminatedOn ?? '',
    },
    practice: c?.practice ?? 'none',
    terraceIntervalM: c?.terraceIntervalM ?? null,
    stripRotation: c?.stripRotation ?? '',
    stripWidthM: c?.stripWidthM ?? null,
  };
}

export function toCroppingUpdate(v: CroppingFormValues, season: string, version: number | undefined): z.input<typeof CroppingUpdate> {
  const grass = isGrass(v.crop);
  return {
    season,
    ...(version !== undefined ? { version } : {}),
    crop: v.crop,
    tillage: grass ? null : v.tillage || null,
    residuePct: grass ? null : v.residuePct,
    groundCoverPct: grass ? v.groundCoverPct : null,
    coverCrop: v.hasCoverCrop
      ? { species: v.coverCrop.species, seededOn: v.coverCrop.seededOn || null, terminatedOn: v.coverCrop.terminatedOn || null }
      : null,
    practice: v.practice,
    terraceIntervalM: v.practice === 'terraces' ? v.terraceIntervalM : null,
    stripRotation: v.practice === 'strip cropping' ? v.stripRotation || null : null,
    stripWidthM: v.practice === 'strip cropping' ? v.stripWidthM : null,
  };
}

const zodCropping = zodResolver(CroppingUpdate);

/** zodResolver(CroppingUpdate), run on the payload the form's choices make. */
export const croppingResolver =
  (season: string, version: number | undefined): Resolver<CroppingFormValues, unknown, CroppingPayload> =>
  (values, context, options) =>
    zodCropping(toCroppingUpdate(values, season, version), context, options as never) as unknown as ReturnType<
      Resolver<CroppingFormValues, unknown, CroppingPayload>
    >;
