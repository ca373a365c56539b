// Which row of the TR-55 curve-number tables a season's cropping falls in: cover type,
// treatment and hydrologic condition (USDA-NRCS 1986, TR-55, tables 2-2b and 2-2c).
export type CroppingForCurveNumber = {
  crop: 'corn' | 'soybean' | 'small grain' | 'hay or meadow' | 'pasture';
  tillage?: string | null;
  residuePct?: number | null;
  groundCoverPct?: number | null;
  coverCrop: boolean;
  practice: 'none' | 'contouring' | 'strip cropping' | 'terraces';
};

export type CurveNumberCover = { cover: string; treatment: string | null; condition: 'poor' | 'fair' | 'good' | null };

/** TR-55 cover, treatment and hydrologic condition for a cropping record (TR-55 tables 2-2b and 2-2c). */
export function curveNumberCover(c: CroppingForCurveNumber): CurveNumberCover {
  if (c.crop === 'pasture') {
    // TR-55 table 2-2c, footnote: poor < 50 % ground cover, fair 50–75 %, good > 75 %.
    const g = c.groundCoverPct ?? 0;
    return { cover: 'pasture', treatment: null, condition: g < 50 ? 'poor' : g <= 75 ? 'fair' : 'good' };
  }
  // TR-55 table 2-2c: meadow, continuous grass protected from grazing, has one row.
  if (c.crop === 'hay or meadow') return { cover: 'meadow', treatment: null, condition: null };
  const cover = c.crop === 'small grain' ? 'small grain' : 'row crops';
  const layout = c.practice === 'terraces' ? 'contoured and terraced' : c.practice === 'contouring' || c.practice === 'strip cropping' ? 'contoured' : 'straight row';
  // TR-55 table 2-2b, footnote: "crop residue cover" applies when residue is on at least 5 % of the surface.
  const residue = (c.residuePct ?? 0) >= 5 ? ' + crop residue' : '';
  // TR-55 table 2-2b, footnote: good condition with ≥ 20 % residue, close-seeded legumes or
  // rotation cover (a cover crop), or less soil disturbance (no-till).
  const good = (c.residuePct ?? 0) >= 20 || c.coverCrop || c.tillage === 'no-till';
  return { cover, treatment: `${layout}${residue}`, condition: good ? 'good' : 'poor' };
}
