// Treatment options for one field: what each changes and what it does not, quantities, costs,
// cautions, and a steep ploughed field brought under T.
import { describe, expect, it } from 'vitest';
import {
  applyTreatments,
  EXAMPLE_PRICES,
  fieldTreatments,
  FILTER_STRIP_WIDTH_M,
  ftToM,
  kFactorWilliams,
  organicCarbonFromOm,
  rusleLS,
  terraceIntervalM,
  type TreatmentSite,
} from '../../../shared/erosion';
import { PRICE_KEYS } from '../../../shared/schemas/treatments';

/** A steep silt-loam slope in ploughed continuous corn, on the demo farm's climate (data/demo: 890 mm rain, 105 mm design storm): continuous corn, fall moldboard plough, 5 % residue, 12 % slope 90 m long; a silt loam with little organic matter. Every treatment kind applies to it. */
function steepPloughedSite(over: Partial<TreatmentSite> = {}): TreatmentSite {
  const soil = { sandPct: 9, siltPct: 69, clayPct: 22, organicMatterPct: 1.75 };
  const kUs = kFactorWilliams({ sandPct: soil.sandPct, siltPct: soil.siltPct, clayPct: soil.clayPct, organicCarbonPct: organicCarbonFromOm(soil.organicMatterPct) }).us;
  return {
    input: {
      r: { from: 'precipitation', annualPrecipitationMm: 890 },
      k: { from: 'value', value: kUs, units: 'us' },
      slopePct: 12,
      slopeLengthM: 90,
      c: { from: 'table', crop: 'corn', tillage: 'moldboard plough', residuePct: 5, coverCrop: false },
      p: { from: 'practice', practice: 'none' },
      areaHa: 14,
      runoff: { rainfallMm: 105, hsg: 'B', cover: 'row crops', treatment: 'straight row + crop residue', condition: 'poor' },
    },
    areaHa: 14,
    soil: { ph: 5.55, bufferPh: 6.35, bufferMethod: 'smp', ...soil, cecCmolPerKg: 14, espPct: 2, bulkDensityMgPerM3: 1.35, notWorthAmending: false, problemClay: false },
    water: { concentratedFlowLengthM: 220, downslopeEdgeLengthM: 380 },
    prices: { ...EXAMPLE_PRICES.prices },
    currency: 'USD',
    units: 'ha',
    ...over,
  };
}

const options = (site: TreatmentSite) => {
  const r = fieldTreatments(site);
  if (!r.ok) throw new Error(r.reason);
  return r.value;
};

describe('fieldTreatments on a steep ploughed field', () => {
  const ft = options(steepPloughedSite());
  it('finds options that bring A under T, with quantities and costs', () => {
    expect(ft.current.aOverT).toBeGreaterThan(1);
    const under = ft.options.filter((o) => o.reachesT);
    expect(under.length).toBeGreaterThan(0);
    for (const o of under) {
      expect(o.quantities.length).toBeGreaterThan(0);
      expect(o.cost.total).toBeGreaterThan(0);
      expect(o.cost.currency).toBe('USD');
    }
    const marked = ft.options.filter((o) => o.cheapestUnderT);
    expect(marked).toHaveLength(1);
    expect(marked[0].cost.total).toBe(Math.min(...under.filter((o) => o.tonnesSavedPerYr > 0).map((o) => o.cost.total)));
  });
  it('counts tonnes saved as (A now − A with the option) × area, and per money', () => {
    for (const o of ft.options) {
      expect(o.tonnesSavedPerYr).toBeCloseTo((ft.current.soilLossTPerHaYr - o.soilLossTPerHaYr) * 14, 8);
      if (o.cost.total > 0) expect(o.tonnesSavedPerMoney).toBeCloseTo(o.tonnesSavedPerYr / o.cost.total, 10);
    }
  });
  it('never puts two tillage systems or two support practices together', () => {
    const tillage = ['no-till', 'reduced-till'];
    const practices = ['contour-farming', 'strip-cropping', 'terraces'];
    for (const o of ft.options) {
      expect(o.treatments.filter((t) => tillage.includes(t)).length).toBeLessThanOrEqual(1);
      expect(o.treatments.filter((t) => practices.includes(t)).length).toBeLessThanOrEqual(1);
    }
  });
  it('gives lime from the SMP reading (SMP table, recalled) with dust and label cautions', () => {
    const lime = ft.options.find((o) => o.id === 'lime')!;
    expect(lime.quantities[0]).toMatchObject({ item: 'agricultural lime', unit: 't' });
    expect(lime.quantities[0].amount).toBeGreaterThan(0);
    expect(lime.tonnesSavedPerYr).toBe(0);
    expect(lime.cautions.join(' ')).toMatch(/dust protection/);
    expect(lime.cost.lines.map((l) => l.priceKey)).toEqual(['lime-per-t', 'spreading-per-ha']);
  });
  it('says contour farming does not work on a 90 m slope at 12 % (AH-537 contouring limit 36 m at 9–12 %, recalled)', () => {
    const u = ft.unavailable.find((x) => x.key === 'contour-farming');
    expect(u?.reason).toMatch(/beyond the 36 m limit/);
  });
});

describe('each treatment changes what it changes, and no more', () => {
  it('cover crop: C × 0.75 (rule of thumb) and the curve number to good condition (TR-55 table 2-2b); cost = price × area', () => {
    const a = applyTreatments(steepPloughedSite(), ['cover-crop']);
    if (!a.ok) throw new Error(a.reason);
    const c = a.value.changes.find((x) => x.factor === 'C')!;
    expect(c.to / c.from).toBeCloseTo(0.75, 10);
    expect(a.value.changes.map((x) => x.factor).sort()).toEqual(['C', 'curve number']);
    // TR-55 table 2-2b, row crops straight row + crop residue, group B: poor 80, good 75
    const cn = a.value.changes.find((x) => x.factor === 'curve number')!;
    expect([cn.from, cn.to]).toEqual([80, 75]);
    expect(a.value.cost.total).toBeCloseTo(EXAMPLE_PRICES.prices['cover-crop-per-ha'] * 14, 8);
  });
  it('reduced tillage and no-till: C from the table row with its typical residue, curve number to residue in good condition (TR-55 table 2-2b, group B: 75)', () => {
    for (const [key, c] of [['reduced-till', 0.25], ['no-till', 0.1]] as const) {
      const a = applyTreatments(steepPloughedSite(), [key]);
      if (!a.ok) throw new Error(a.reason);
      expect(a.value.estimate.factors.c.value).toBeCloseTo(c, 10);
      expect(a.value.estimate.runoff!.cn.value).toBe(75);
      expect(a.value.changes.map((x) => x.factor).sort()).toEqual(['C', 'curve number']);
    }
  });
  it('contour farming on 5 % and 60 m: P 0.5 within its 90 m limit (AH-537 contouring table, recalled), combined with no-till and a cover crop', () => {
    const site = steepPloughedSite();
    site.input = { ...site.input, slopePct: 5, slopeLengthM: 60 };
    const ft = options(site);
    const contour = ft.options.find((o) => o.id === 'contour-farming')!;
    expect(contour.changes.find((x) => x.factor === 'P')).toMatchObject({ from: 1, to: 0.5 });
    // TR-55 table 2-2b, row crops contoured + crop residue, group B: poor 78
    expect(contour.changes.find((x) => x.factor === 'curve number')).toMatchObject({ from: 80, to: 78 });
    expect(ft.options.map((o) => o.id)).toEqual(expect.arrayContaining(['contour-farming+no-till+cover-crop', 'strip-cropping+cover-crop']));
  });
  it('terraces: slope length = interval by the spacing rule of thumb, P from the contour row, terrace metres = area / interval', () => {
    const a = applyTreatments(steepPloughedSite(), ['terraces']);
    if (!a.ok) throw new Error(a.reason);
    // VI = 0.6·12 + 2.5 = 9.7 ft; horizontal interval = 9.7 / 0.12 ft
    const interval = ftToM(9.7 / 0.12);
    expect(terraceIntervalM(12)).toBeCloseTo(interval, 10);
    expect(a.value.changes.find((x) => x.factor === 'slope length')).toMatchObject({ from: 90 });
    expect(a.value.changes.find((x) => x.factor === 'slope length')!.to).toBeCloseTo(interval, 8);
    // AH-537 contouring P at 9–12 % slope: 0.6 (recalled)
    expect(a.value.estimate.factors.p.value).toBe(0.6);
    expect(a.value.quantities[0]).toMatchObject({ item: 'terrace', unit: 'm', amount: Math.round((14 * 10_000) / interval) });
    expect(a.value.cautions.join(' ')).toMatch(/qualified person/);
    expect(a.value.cautions.join(' ')).toMatch(/buried utilities/);
  });
  it('terraces on a field with an elevation-model LS take LS on the terrace interval instead', () => {
    const site = steepPloughedSite();
    site.input = { ...site.input, lsFromGrid: { value: 2.1, source: 'test grid', method: 'test' } };
    const a = applyTreatments(site, ['terraces']);
    if (!a.ok) throw new Error(a.reason);
    // AH-703 LS (moderate ratio) on the terrace interval at the mean slope, not the grid's 2.1
    expect(a.value.estimate.factors.ls.value).toBeCloseTo(rusleLS({ slopePct: 12, lengthM: terraceIntervalM(12) }).ls, 9);
    expect(a.ok && a.value.changes.find((x) => x.factor === 'slope length')!.why).toMatch(/replaces the elevation model's LS/);
  });
  it('grassed waterway: gully control, A unchanged, length from the flow path', () => {
    const a = applyTreatments(steepPloughedSite(), ['grassed-waterway']);
    if (!a.ok) throw new Error(a.reason);
    expect(a.value.changes).toEqual([]);
    expect(a.value.effects.join(' ')).toMatch(/Gully control/);
    expect(a.value.effects.join(' ')).toMatch(/A .* does not change/);
    expect(a.value.quantities[0]).toMatchObject({ item: 'grassed waterway', amount: 220, unit: 'm' });
    expect(a.value.cost.total).toBeCloseTo(220 * EXAMPLE_PRICES.prices['waterway-per-m'], 8);
  });
  it('filter strip: sediment trapping, A unchanged, strip area = edge × width', () => {
    const a = applyTreatments(steepPloughedSite(), ['filter-strip']);
    if (!a.ok) throw new Error(a.reason);
    expect(a.value.changes).toEqual([]);
    expect(a.value.effects.join(' ')).toMatch(/Sediment trapping/);
    expect(a.value.quantities[1].amount).toBeCloseTo((380 * FILTER_STRIP_WIDTH_M) / 10_000, 2);
  });
  it('organic matter: only K moves, by the nomograph’s organic-matter term (AH-703 eq. 3-1)', () => {
    const a = applyTreatments(steepPloughedSite(), ['organic-matter']);
    if (!a.ok) throw new Error(a.reason);
    expect(a.value.changes.map((x) => x.factor)).toEqual(['K']);
    const k = a.value.changes[0];
    expect(k.to).toBeLessThan(k.from);
    expect(k.why).toMatch(/\+0\.5 %/);
  });
  it('refuses two tillage systems, and a treatment the field cannot take, in words', () => {
    expect(applyTreatments(steepPloughedSite(), ['no-till', 'reduced-till'])).toMatchObject({ ok: false, reason: expect.stringMatching(/two tillage systems/) });
    expect(applyTreatments(steepPloughedSite(), ['raised-beds'])).toMatchObject({ ok: false, reason: expect.stringMatching(/gray or mottled/) });
  });
});

describe('what the engine will not guess', () => {
  it('a typed C: cover crop and tillage cannot be predicted', () => {
    const site = steepPloughedSite();
    site.input = { ...site.input, c: { from: 'value', value: 0.3 } };
    const ft = options(site);
    for (const key of ['cover-crop', 'no-till', 'reduced-till']) {
      expect(ft.unavailable.find((u) => u.key === key)?.reason).toMatch(/typed in as a value/);
    }
  });
  it('a typed curve number: runoff stays as typed, and the option says so', () => {
    const site = steepPloughedSite();
    site.input = { ...site.input, runoff: { rainfallMm: 105, cn: 82 } };
    const a = applyTreatments(site, ['cover-crop']);
    if (!a.ok) throw new Error(a.reason);
    expect(a.value.changes.map((x) => x.factor)).toEqual(['C']);
    expect(a.value.effects.join(' ')).toMatch(/curve number was typed in/);
  });
  it('a typed P: support practices cannot be predicted', () => {
    const site = steepPloughedSite();
    site.input = { ...site.input, p: { from: 'value', value: 0.5 } };
    expect(options(site).unavailable.find((u) => u.key === 'terraces')?.reason).toMatch(/P was typed in/);
  });
  it('lime without the buffer method, and without a soil check, says which is needed', () => {
    const site = steepPloughedSite();
    site.soil = { ...site.soil, bufferMethod: null };
    expect(options(site).unavailable.find((u) => u.key === 'lime')).toMatchObject({ needs: 'buffer-method' });
    site.soil = { ...site.soil, ph: null };
    expect(options(site).unavailable.find((u) => u.key === 'lime')).toMatchObject({ needs: 'soil-check' });
  });
  it('lime at a pH already at the target is not offered, with the reason', () => {
    const site = steepPloughedSite();
    site.soil = { ...site.soil, ph: 6.7 };
    expect(options(site).unavailable.find((u) => u.key === 'lime')?.reason).toMatch(/already at or above the target/);
  });
  it('ground with shallow gray subsoil: no amendments, raised beds, drainage or permanent cover instead', () => {
    const site = steepPloughedSite();
    site.soil = { ...site.soil, notWorthAmending: true, problemClay: true };
    site.input = { ...site.input, runoff: { ...site.input.runoff!, hsg: 'C/D' } };
    const ft = options(site);
    for (const key of ['lime', 'gypsum', 'organic-matter']) expect(ft.unavailable.find((u) => u.key === key)?.reason).toMatch(/amendments will not fix/);
    const ids = ft.options.map((o) => o.id);
    expect(ids).toEqual(expect.arrayContaining(['raised-beds', 'drainage', 'permanent-cover']));
    const drain = ft.options.find((o) => o.id === 'drainage')!;
    // TR-55 ch. 2: a drained dual group takes its first letter (row crops straight row + residue, poor: C 87, D 90)
    expect(drain.changes).toEqual([expect.objectContaining({ factor: 'curve number', from: 90, to: 87 })]);
    expect(drain.cautions.join(' ')).toMatch(/Drainage needs a design/);
  });
  it('gypsum on sodic soil orders pure × efficiency ÷ purity, from the farm’s own figures', () => {
    const site = steepPloughedSite();
    site.soil = { ...site.soil, espPct: 20, cecCmolPerKg: 20, bulkDensityMgPerM3: 1.3 };
    site.amendments = { gypsumPurityPct: 80, gypsumExchangeEfficiency: 1.1 };
    const g = options(site).options.find((o) => o.id === 'gypsum')!;
    // USDA Handbook 60 stoichiometry: 0.0861 × ΔNa 3 × 15 cm × 1.3
    expect(g.quantities[0].amount).toBeCloseTo(Math.round((((0.0861 * 3 * 15 * 1.3 * 1.1) / 0.8) * 14) * 100) / 100, 2);
    expect(g.quantities[0].note).toMatch(/exchange efficiency 1\.1 ÷ purity 80 %/);
    expect(g.changes).toEqual([]);
  });
});

describe('example prices', () => {
  it('have every price-list item, in US dollars, as example values', () => {
    expect(EXAMPLE_PRICES.currency).toBe('USD');
    expect(Object.keys(EXAMPLE_PRICES.prices).sort()).toEqual([...PRICE_KEYS].sort());
    expect(EXAMPLE_PRICES.source).toMatch(/example values — replace with your local figures/);
  });
});

describe('strips and contouring as treatments', () => {
  it('offers strips in the rotation of row crop and winter grain: AH-537 table 14, rotation C (recalled values)', () => {
    // 7 % slope, 60 m (within the 400 ft strip limit): table 14 rotation C at 6–8 % gives P 0.50.
    const ft = options(steepPloughedSite({ input: { ...steepPloughedSite().input, slopePct: 7, slopeLengthM: 60 } }));
    const strips = ft.options.find((o) => o.id === 'strip-cropping')!;
    expect(strips.changes).toContainEqual(expect.objectContaining({ factor: 'P', from: 1, to: 0.5 }));
    expect(strips.effects.join(' ')).toMatch(/rotation C/);
  });

  it('offers no contouring or strips on pasture or hay, which are not tilled', () => {
    const base = steepPloughedSite().input;
    const ft = options(steepPloughedSite({ input: { ...base, slopePct: 7, slopeLengthM: 60, c: { from: 'table', crop: 'pasture', groundCoverPct: 60 } } }));
    expect(ft.options.some((o) => o.treatments.includes('contour-farming') || o.treatments.includes('strip-cropping'))).toBe(false);
    expect(ft.unavailable.find((u) => u.key === 'strip-cropping')!.reason).toMatch(/pasture already covers the ground/);
  });
});
