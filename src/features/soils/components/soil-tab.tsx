// The Field screen's Soil tab: the field's soil summary at the top; its samples (typed lab
// results, a feel test, or a CSV from the lab) with the texture triangle; profile photos; the
// soil map units under the field, and for farmer and advisor the farm's soil map itself.
// Farmer and advisor change soils; a landowner reads.
import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import type { Separates, TextureClass } from '../../../../shared/erosion/texture';
import { useMe } from '../../auth/api/get-me';
import { useSoilSamples } from '../api/get-soil-samples';
import { useSoilSummary } from '../api/get-soil-summary';
import { WaitingChecksNotice } from '../offline/waiting-checks-notice';
import { FeelTestWizard } from './feel-test-wizard';
import { FieldSoilMapUnits } from './field-soil-map-units';
import { SampleForm } from './sample-form';
import { SoilCsvUpload } from './soil-csv-upload';
import { SoilMapPanel } from './soil-map-panel';
import { SoilPhotos } from './soil-photos';
import { SoilSampleTable } from './soil-sample-table';
import { SoilSummaryCard } from './soil-summary-card';
import { fmtPct } from './format-soil';
import { TextureTriangle, type TrianglePoint } from './texture-triangle';

export type SoilTabProps = { fieldId: number; farmId: number; role: 'farmer' | 'advisor' | 'landowner' };

type Adding = 'lab' | 'feel' | null;

export function SoilTab({ fieldId, farmId, role }: SoilTabProps) {
  const canEdit = role === 'farmer' || role === 'advisor';
  const me = useMe().data;
  const units = me?.units ?? 'ha';
  const samples = useSoilSamples(fieldId);
  const summary = useSoilSummary(fieldId);
  const [adding, setAdding] = useState<Adding>(null);

  const list = samples.data ?? [];
  const points: TrianglePoint[] = list
    .filter((s) => s.sandPct !== null && s.siltPct !== null && s.clayPct !== null)
    .map((s) => ({ id: s.id, label: s.label ?? `Sample ${s.id}`, separates: { sand: s.sandPct!, silt: s.siltPct!, clay: s.clayPct! } }));
  const sm = summary.data;
  const mean: Separates | null =
    sm && sm.sandPct !== null && sm.siltPct !== null && sm.clayPct !== null && points.length > 1 ? { sand: sm.sandPct, silt: sm.siltPct, clay: sm.clayPct } : null;
  const feelCount = list.filter((s) => s.kind === 'feel').length;

  return (
    <div className="flex flex-col gap-5" data-testid="soil-tab">
      <SoilSummaryCard fieldId={fieldId} units={units} />

      <section aria-labelledby="soil-samples-heading" className="flex flex-col gap-3">
        <div className="flex flex-wrap items-center justify-between gap-2">
          <h2 id="soil-samples-heading" className="text-lg font-semibold">
            Soil samples
          </h2>
          {canEdit ? (
            <div className="flex flex-wrap gap-2">
              <Button variant={adding === 'lab' ? 'primary' : 'secondary'} size="sm" onClick={() => setAdding(adding === 'lab' ? null : 'lab')} aria-expanded={adding === 'lab'} data-testid="add-lab-sample">
                Type lab results
              </Button>
              <Button variant={adding === 'feel' ? 'primary' : 'secondary'} size="sm" onClick={() => setAdding(adding === 'feel' ? null : 'feel')} aria-expanded={adding === 'feel'} data-testid="add-feel-test">
                Do a feel test
              </Button>
            </div>
          ) : null}
        </div>
        {me ? <WaitingChecksNotice userId={me.id} /> : null}
        {adding === 'lab' ? <SampleForm fieldId={fieldId} onDone={() => setAdding(null)} /> : null}
        {adding === 'feel' ? <FeelTestWizard fieldId={fieldId} onDone={() => setAdding(null)} /> : null}
        {samples.isPending ? (
          <p className="text-sm text-ink-soft">Loading…</p>
        ) : samples.isError ? (
          <Notice tone="error">{samples.error.message}</Notice>
        ) : (
          <SoilSampleTable fieldId={fieldId} samples={list} canEdit={canEdit} />
        )}
        {canEdit ? <SoilCsvUpload fieldId={fieldId} /> : null}
      </section>

      <section aria-labelledby="texture-triangle-heading" className="flex flex-col gap-2">
        <h3 id="texture-triangle-heading" className="text-base font-semibold">
          Where the lab samples sit on the texture triangle
        </h3>
        <div className="grid gap-4 md:grid-cols-[minmax(0,3fr)_minmax(0,1fr)]">
          <TextureTriangle points={points} mean={mean} meanClass={mean ? ((sm?.textureClass as TextureClass | null) ?? null) : null} />
          <div className="flex flex-col gap-2 text-sm">
            {points.length ? (
              <ul className="flex flex-col gap-1" aria-label="Samples on the chart">
                {list
                  .filter((s) => points.some((p) => p.id === s.id))
                  .map((s) => (
                    <li key={s.id}>
                      <span className="font-medium">{s.label ?? `Sample ${s.id}`}</span>
                      <span className="num block text-ink-soft">
                        {s.textureClass}: sand {fmtPct(s.sandPct!)}, silt {fmtPct(s.siltPct!)}, clay {fmtPct(s.clayPct!)}
                      </span>
                    </li>
                  ))}
              </ul>
            ) : (
              <p className="text-ink-soft">No lab samples with sand, silt and clay yet.</p>
            )}
            {feelCount ? (
              <p className="text-ink-soft">
                <span className="num">{feelCount}</span> feel {feelCount === 1 ? 'test has' : 'tests have'} a class but no percentages, so{' '}
                {feelCount === 1 ? 'it is' : 'they are'} not drawn.
              </p>
            ) : null}
          </div>
        </div>
      </section>

      <SoilPhotos fieldId={fieldId} canEdit={canEdit} samples={list} />

      <FieldSoilMapUnits fieldId={fieldId} units={units} />

      {canEdit ? (
        <details className="rounded-md border border-paper-edge" data-testid="soil-tab-farm-map">
          <summary className="cursor-pointer px-3 py-2 font-medium">The farm's soil map (for every field)</summary>
          <div className="p-2">
            <SoilMapPanel farmId={farmId} role={role} />
          </div>
        </details>
      ) : null}
    </div>
  );
}
