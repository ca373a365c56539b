// GET /api/plans/:planId/report.pdf: the season plan as a PDF. Its text, read back with PDF.js,
// holds the farm, every field, the figures of the stored assessments and the cautions; a
// landowner's copy holds only their fields, as the plan was approved.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { makeTestApp, makeUser, signedIn } from '../helpers/test-app';
import { makePlanFarm } from '../helpers/plan-farm';
import { pdfPageTexts } from '../helpers/pdf-text';
import { CAUTIONS, DEFER_TO_LOCAL_PRACTICE } from '../../shared/erosion/treatments/cautions';
import { formatFigure } from '../../shared/format/figure';

const ctx = makeTestApp();
afterAll(() => ctx.close());
let farm: Awaited<ReturnType<typeof makePlanFarm>>;
beforeAll(async () => {
  farm = await makePlanFarm(ctx.app, ctx.sequelize);
});

const url = () => `/api/plans/${farm.planId}/report.pdf`;
const squash = (s: string) => s.replace(/\s+/g, ' ');

async function report(agent: Awaited<ReturnType<typeof signedIn>>) {
  const res = await agent.get(url()).responseType('blob');
  expect(res.status).toBe(200);
  expect(res.headers['content-type']).toBe('application/pdf');
  const pages = await pdfPageTexts(res.body as Buffer);
  return { res, pages, all: squash(pages.join(' ')) };
}

describe('plan report PDF', () => {
  it('holds the farm, the season, the state, every field with its figures, and the cautions', async () => {
    const { res, pages, all } = await report(farm.agents.farmer);
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="test-farm-[a-z0-9]+-2027-season-plan\.pdf"$/);
    expect(pages[0]).toContain(farm.farm.name);
    expect(pages[0]).toContain('Season 2027');
    for (const name of ['Long Slope', 'Mill Hill', 'Hay Ground']) expect(all).toContain(name);
    // Figures as the stored assessments have them (t/ha/yr for a hectare user).
    const a = (await farm.agents.farmer.get(`/api/fields/${farm.ids['Long Slope']}/assessment?season=2027`)).body;
    expect(all).toContain(`A, average yearly soil loss ${formatFigure(a.soilLossTPerHaYr)} t/ha/yr`);
    expect(all).toContain(`K, soil erodibility ${formatFigure(a.estimate.factors.k.value)}`);
    expect(all).toContain(squash(a.estimate.factors.r.source));
    expect(all).toContain('A after the plan');
    expect(all).toContain('Grassed waterway');
    expect(all).toContain('Farm totals');
    expect(all).toContain('Month by month');
    expect(all).toContain('August 2027');
    expect(all).toContain(squash(CAUTIONS.earthwork));
    expect(all).toContain(squash(CAUTIONS.dust));
    expect(pages.at(-1)).toMatch(new RegExp(`page ${pages.length} of ${pages.length}`));
  });

  it('carries the deferral to local standards and professionals on every page that lists earthwork, drainage, lime or gypsum', async () => {
    const { pages } = await report(farm.agents.advisor);
    const careful = /Grassed waterway|Terraces|Subsurface drainage|Lime|Gypsum/;
    const listing = pages.filter((p) => careful.test(p));
    expect(listing.length).toBeGreaterThan(0);
    for (const p of listing) expect(squash(p)).toContain(squash(DEFER_TO_LOCAL_PRACTICE));
  });

  it("gives a landowner only their fields, as the plan was approved", async () => {
    const { all } = await report(farm.agents.landowner);
    expect(all).toContain('Mill Hill');
    expect(all).not.toContain('Long Slope');
    expect(all).not.toContain('Hay Ground');
    expect(all).toContain('Lime');
    // The gypsum was added after approval, in a draft the landowner does not see.
    expect(all).not.toContain('Gypsum');
    expect(all).toContain('Approved by Test advisor');
  });

  it('answers 404 to strangers and for plans that do not exist', async () => {
    const stranger = await signedIn(ctx.app, await makeUser());
    expect((await stranger.get(url())).status).toBe(404);
    expect((await farm.agents.farmer.get('/api/plans/2147483000/report.pdf')).status).toBe(404);
    expect((await farm.agents.farmer.get('/api/plans/abc/report.pdf')).status).toBe(400);
  });
});
