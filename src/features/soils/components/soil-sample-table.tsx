// The field's soil samples, one row each: what kind, when and how deep, the separates, the
// texture class, organic matter, pH, the drainage verdict. Farmer and advisor change or
// delete a row in place (delete asks once more). On a phone each sample is a card instead.
import { LastChange } from '../../../components/last-change';
import { Fragment, useState, type ReactNode } from 'react';
import { useNarrowScreen } from '../../../lib/use-narrow-screen';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { BUFFER_METHOD_NAMES, type SoilSample } from '../../../../shared/schemas/soils';
import { useDeleteSoilSample } from '../api/delete-soil-sample';
import { depthRange, fmt, fmtCm, fmtPct, fmtPh, formatDay } from './format-soil';
import { SampleForm } from './sample-form';

const dash = <span className="text-ink-faint">—</span>;

function feelWords(s: SoilSample): string {
  const f = s.feelTest;
  if (!f) return '';
  if (!f.balls) return 'will not ball';
  if (!f.ribbonCm) return 'balls, no ribbon';
  return `ribbon ${fmt(f.ribbonCm, 1)} cm${f.ribbonClass ? ` (${f.ribbonClass})` : ''}, ${f.feel === 'neither' ? 'neither gritty nor smooth' : `very ${f.feel}`}`;
}

function Separates({ s }: { s: SoilSample }) {
  if (s.sandPct === null || s.siltPct === null || s.clayPct === null) return s.kind === 'feel' ? <span className="text-ink-soft">{feelWords(s)}</span> : dash;
  return (
    <span className="num whitespace-nowrap">
      {fmt(s.sandPct, 0)} / {fmt(s.siltPct, 0)} / {fmt(s.clayPct, 0)} %
    </span>
  );
}

function DeleteButton({ sample, fieldId }: { sample: SoilSample; fieldId: number }) {
  const [confirm, setConfirm] = useState(false);
  const remove = useDeleteSoilSample(fieldId);
  if (!confirm)
    return (
      <Button variant="danger" size="sm" onClick={() => setConfirm(true)} data-testid="sample-delete">
        Delete
      </Button>
    );
  return (
    <span className="flex flex-wrap items-center gap-1">
      <Button variant="danger" size="sm" disabled={remove.isPending} onClick={() => remove.mutate(sample.id)} data-testid="sample-delete-confirm">
        {remove.isPending ? 'Deleting…' : 'Yes, delete'}
      </Button>
      <Button variant="secondary" size="sm" onClick={() => setConfirm(false)}>
        Keep
      </Button>
      {remove.isError ? <span className="text-sm text-alert">{remove.error.message}</span> : null}
    </span>
  );
}

/** The headings of a sample's figures after its name; the table and the phone's cards both show them. */
const FIGURES = ['Sand / silt / clay', 'Texture class', 'Organic matter', 'pH', 'Drainage'] as const;

/** A sample's figures, in the order of FIGURES. */
function figuresOf(s: SoilSample): { label: (typeof FIGURES)[number]; content: ReactNode }[] {
  const content: ReactNode[] = [
    (
      <>
        <Separates s={s} />
        {s.separatesSumPct !== null && Math.abs(s.separatesSumPct - 100) > 0.05 ? (
          <span className="num block text-xs text-ink-soft">typed sum {fmt(s.separatesSumPct, 1)} %, scaled</span>
        ) : null}
      </>
    ),
    s.textureClass ?? dash,
    <span className="num">{s.organicMatterPct !== null ? fmtPct(s.organicMatterPct, 1) : dash}</span>,
    (
      <span className="num">
        {s.ph !== null ? fmtPh(s.ph) : dash}
        {s.bufferPh !== null ? <span className="block text-xs text-ink-soft">{s.bufferMethod ? BUFFER_METHOD_NAMES[s.bufferMethod] : 'buffer'} {fmtPh(s.bufferPh)}</span> : null}
      </span>
    ),
    (
      <>
        {s.drainageClass ?? dash}
        <span className="num block text-xs text-ink-soft">
          {s.depthToGrayCm !== null ? `gray from ${fmtCm(s.depthToGrayCm)}` : s.describedToCm !== null ? `no gray to ${fmtCm(s.describedToCm)}` : null}
        </span>
      </>
    ),
  ];
  return FIGURES.map((label, i) => ({ label, content: content[i] }));
}

const COLUMNS = ['Sample', ...FIGURES];

/** The sample's name, then kind, day, depth and where it was taken, and who changed it last. */
function SampleName({ s }: { s: SoilSample }) {
  return (
    <>
      <span className="font-medium">{s.label ?? `Sample ${s.id}`}</span>
      <span className="num block text-xs text-ink-soft">
        {[
          s.kind === 'lab' ? 'lab results' : 'feel test',
          s.sampledOn ? formatDay(s.sampledOn) : null,
          depthRange(s.depthTopCm, s.depthBottomCm),
          s.position ? `at ${fmt(s.position.lat, 5)}°, ${fmt(s.position.lng, 5)}° (within ${fmt(s.position.accuracyM, 0)} m)` : null,
        ]
          .filter(Boolean)
          .join(' · ')}
      </span>
      <LastChange change={s.lastChange} testId="soil-sample-last-change" />
    </>
  );
}

function ChangeButtons({ s, fieldId, editing, onEdit }: { s: SoilSample; fieldId: number; editing: boolean; onEdit: () => void }) {
  return (
    <span className="flex flex-wrap justify-end gap-1 whitespace-nowrap">
      <Button variant="secondary" size="sm" onClick={onEdit} data-testid="sample-edit" aria-expanded={editing}>
        Change
      </Button>
      <DeleteButton sample={s} fieldId={fieldId} />
    </span>
  );
}

/** On a phone: one card per sample, the figures as labelled lines. */
function SampleCards({ fieldId, samples, canEdit }: Props) {
  const [editing, setEditing] = useState<number | null>(null);
  return (
    <ul className="flex flex-col gap-2" data-testid="soil-sample-cards">
      {samples.map((s) => (
        <li key={s.id} className="flex flex-col gap-2 rounded-md border border-paper-edge bg-white/40 p-3" data-testid="soil-sample-card" data-sample-id={s.id}>
          <div>
            <SampleName s={s} />
          </div>
          <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-sm">
            {figuresOf(s).map((f) => (
              <div key={f.label} className="contents">
                <dt className="text-ink-soft">{f.label}</dt>
                <dd className="min-w-0 text-right">{f.content}</dd>
              </div>
            ))}
          </dl>
          {canEdit ? <ChangeButtons s={s} fieldId={fieldId} editing={editing === s.id} onEdit={() => setEditing(editing === s.id ? null : s.id)} /> : null}
          {editing === s.id ? <SampleForm key={s.id} fieldId={fieldId} sample={s} onDone={() => setEditing(null)} /> : null}
        </li>
      ))}
    </ul>
  );
}

type Props = { fieldId: number; samples: SoilSample[]; canEdit: boolean };

export function SoilSampleTable({ fieldId, samples, canEdit }: Props) {
  const [editing, setEditing] = useState<number | null>(null);
  const narrow = useNarrowScreen();
  if (samples.length === 0)
    return (
      <Notice tone="info" testId="soil-samples-none">
        No soil samples yet.{canEdit ? ' Type lab results, run a feel test, or upload a CSV from the lab.' : ''}
      </Notice>
    );
  if (narrow) return <SampleCards fieldId={fieldId} samples={samples} canEdit={canEdit} />;
  const span = COLUMNS.length + (canEdit ? 1 : 0);
  return (
    <div className="overflow-x-auto rounded-md border border-paper-edge bg-white/40">
      <table className="w-full border-collapse text-sm" data-testid="soil-sample-table">
        <thead>
          <tr className="border-b border-paper-edge text-left text-ink-soft">
            {COLUMNS.map((c) => (
              <th key={c} scope="col" className="px-2 py-1.5 font-medium">
                {c}
              </th>
            ))}
            {canEdit ? <th scope="col" className="px-2 py-1.5"><span className="sr-only">Change</span></th> : null}
          </tr>
        </thead>
        <tbody>
          {samples.map((s) => (
            <Fragment key={s.id}>
              <tr className="border-b border-paper-edge align-top last:border-b-0" data-testid="soil-sample-row" data-sample-id={s.id}>
                <td className="px-2 py-1.5">
                  <SampleName s={s} />
                </td>
                {figuresOf(s).map((f) => (
                  <td key={f.label} className="px-2 py-1.5">
                    {f.content}
                  </td>
                ))}
                {canEdit ? (
                  <td className="px-2 py-1.5">
                    <ChangeButtons s={s} fieldId={fieldId} editing={editing === s.id} onEdit={() => setEditing(editing === s.id ? null : s.id)} />
                  </td>
                ) : null}
              </tr>
              {editing === s.id ? (
                <tr className="border-b border-paper-edge bg-paper">
                  <td colSpan={span} className="p-2">
                    <SampleForm key={s.id} fieldId={fieldId} sample={s} onDone={() => setEditing(null)} />
                  </td>
                </tr>
              ) : null}
            </Fragment>
          ))}
        </tbody>
      </table>
    </div>
  );
}
