// A season's cropping → the TR-55 curve-number row (USDA-NRCS 1986, TR-55, tables 2-2b and
// 2-2c), and the deep-soil default T.
import { describe, expect, it } from 'vitest';
import { curveNumberCover, DEFAULT_T_SOURCE, DEFAULT_T_TON_PER_AC_YR, soilLossTolerance } from '../../../shared/erosion';

const row = { coverCrop: false, practice: 'none' as const };

describe('TR-55 cover for a cropping record', () => {
  it('rates pasture by ground cover: poor < 50 %, fair 50–75 %, good > 75 % (TR-55 table 2-2c, footnote)', () => {
    expect(curveNumberCover({ ...row, crop: 'pasture', groundCoverPct: 49 })).toEqual({ cover: 'pasture', treatment: null, condition: 'poor' });
    expect(curveNumberCover({ ...row, crop: 'pasture', groundCoverPct: 50 }).condition).toBe('fair');
    expect(curveNumberCover({ ...row, crop: 'pasture', groundCoverPct: 75 }).condition).toBe('fair');
    expect(curveNumberCover({ ...row, crop: 'pasture', groundCoverPct: 76 }).condition).toBe('good');
  });

  it('takes hay as meadow, the single row of TR-55 table 2-2c', () => {
    expect(curveNumberCover({ ...row, crop: 'hay or meadow' })).toEqual({ cover: 'meadow', treatment: null, condition: null });
  });

  it('adds crop residue cover from 5 % residue, good from 20 % (TR-55 table 2-2b, footnotes)', () => {
    expect(curveNumberCover({ ...row, crop: 'corn', tillage: 'moldboard plough', residuePct: 4 })).toEqual({ cover: 'row crops', treatment: 'straight row', condition: 'poor' });
    expect(curveNumberCover({ ...row, crop: 'corn', tillage: 'chisel or mulch-till', residuePct: 10 })).toEqual({ cover: 'row crops', treatment: 'straight row + crop residue', condition: 'poor' });
    expect(curveNumberCover({ ...row, crop: 'soybean', tillage: 'chisel or mulch-till', residuePct: 20 }).condition).toBe('good');
  });

  it('counts no-till and a cover crop as good hydrologic condition (TR-55 table 2-2b, footnote)', () => {
    expect(curveNumberCover({ ...row, crop: 'corn', tillage: 'no-till', residuePct: 0 }).condition).toBe('good');
    expect(curveNumberCover({ ...row, crop: 'small grain', tillage: 'moldboard plough', coverCrop: true })).toMatchObject({ cover: 'small grain', condition: 'good' });
  });

  it('names the layout of TR-55 table 2-2b: straight row, contoured, contoured and terraced', () => {
    expect(curveNumberCover({ ...row, crop: 'corn', tillage: 'no-till', practice: 'contouring' }).treatment).toBe('contoured');
    expect(curveNumberCover({ ...row, crop: 'corn', tillage: 'no-till', practice: 'strip cropping' }).treatment).toBe('contoured');
    expect(curveNumberCover({ ...row, crop: 'corn', tillage: 'no-till', residuePct: 30, practice: 'terraces' }).treatment).toBe('contoured and terraced + crop residue');
  });
});

describe('default soil-loss tolerance', () => {
  it('is 5 t/ac/yr for a deep soil, the top of the NSSH part 618 range, named as common practice', () => {
    expect(DEFAULT_T_TON_PER_AC_YR).toBe(5);
    expect(soilLossTolerance().tonPerAcYr).toBe(DEFAULT_T_TON_PER_AC_YR);
    expect(DEFAULT_T_SOURCE.title).toMatch(/common practice/);
  });
});
