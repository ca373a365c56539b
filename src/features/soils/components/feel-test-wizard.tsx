// The feel test, one question at a time: does moist soil ball → how long a ribbon → gritty,
// smooth or neither. The engine's key (shared/erosion textureByFeel, Thien 1979) gives the
// texture class, shown before anything is saved; then a few optional figures, a photo and the
// GPS position, and Save. Saving keeps the check in the browser first and sends it from there,
// so a check made with no network waits on the phone and goes when the network is back.
import { useEffect, useState } from 'react';
import { FormProvider, useForm } from 'react-hook-form';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { DEFAULT_FEEL_KEY, textureByFeel, type FeelClass } from '../../../../shared/erosion/texture';
import type { FeelGrit, SoilSampleCreate } from '../../../../shared/schemas/soils';
import { useMe } from '../../auth/api/get-me';
import { useKeepSoilCheck } from '../offline/waiting-checks-queries';
import { FieldExtrasInputs, photoTooBig, type FieldExtras } from './field-extras';
import { fmt } from './format-soil';
import { BallDiagram, PinchDiagram, RibbonDiagram } from './feel-diagrams';
import { sampleResolver, type SampleFormValues } from './sample-form-values';
import { ChemistryInputs, DrainageInputs, WhereWhenInputs } from './sample-inputs';

const { weakBelowCm, strongAboveCm } = DEFAULT_FEEL_KEY.ribbonThresholdsCm;

/** To the nearest half centimetre. */
const half = (cm: number) => Math.round(cm * 2) / 2;

type RibbonChoice = { key: string; label: string; detail: string; cm: number };
/** A typical length for each ribbon class, stored when the person picks the class, not a length. */
const RIBBONS: RibbonChoice[] = [
  { key: 'none', label: 'No ribbon', detail: 'it breaks at once', cm: 0 },
  { key: 'weak', label: 'Short', detail: `under ${fmt(weakBelowCm, 1)} cm`, cm: half(weakBelowCm * 0.6) },
  { key: 'medium', label: 'Medium', detail: `${fmt(weakBelowCm, 1)}–${fmt(strongAboveCm, 0)} cm`, cm: half((weakBelowCm + strongAboveCm) / 2) },
  { key: 'strong', label: 'Long', detail: `over ${fmt(strongAboveCm, 0)} cm`, cm: strongAboveCm + 2 },
];

const FEELS: { value: FeelGrit; label: string; detail: string; engine: FeelClass }[] = [
  { value: 'gritty', label: 'Very gritty', detail: 'you feel sand grains', engine: 'very gritty' },
  { value: 'smooth', label: 'Very smooth', detail: 'silky, like flour', engine: 'very smooth' },
  { value: 'neither', label: 'Neither', detail: 'somewhere between', engine: 'neither' },
];

type Answers = { balls?: boolean; ribbonCm?: number; feel?: FeelGrit };

function Choice({ selected, onClick, label, detail, testId }: { selected: boolean; onClick: () => void; label: string; detail?: string; testId?: string }) {
  return (
    <button
      type="button"
      aria-pressed={selected}
      onClick={onClick}
      data-testid={testId}
      className={`flex min-w-28 flex-col items-start rounded-md border px-3 py-2 text-left ${
        selected ? 'border-clay-dark bg-clay text-paper' : 'border-ink-faint bg-paper text-ink hover:bg-paper-deep'
      }`}
    >
      <span className="font-medium">{label}</span>
      {detail ? <span className={`num text-sm ${selected ? 'text-paper' : 'text-ink-soft'}`}>{detail}</span> : null}
    </button>
  );
}

function Step({ n, of, question, children, picture }: { n: number; of: number; question: string; children: React.ReactNode; picture: React.ReactNode }) {
  return (
    <div className="flex flex-col gap-3 sm:flex-row sm:items-start">
      <div className="shrink-0 rounded-md border border-paper-edge bg-paper p-1">{picture}</div>
      <div className="flex flex-col gap-2">
        <p className="num text-xs font-semibold uppercase tracking-wide text-clay-dark">
          Step {n} of {of}
        </p>
        <p className="font-medium">{question}</p>
        {children}
      </div>
    </div>
  );
}

/** The class by the engine's key, or what is still missing. */
function classOf(a: Answers) {
  if (a.balls === undefined) return null;
  const feel = FEELS.find((f) => f.value === a.feel)?.engine;
  return textureByFeel({ balls: a.balls, ribbonCm: a.ribbonCm, feel });
}

export function FeelTestWizard({ fieldId, onDone }: { fieldId: number; onDone: () => void }) {
  const [step, setStep] = useState<1 | 2 | 3 | 4>(1);
  const [answers, setAnswers] = useState<Answers>({});
  const [typedCm, setTypedCm] = useState('');
  const keep = useKeepSoilCheck();
  const userId = useMe().data?.id;
  const [extras, setExtras] = useState<FieldExtras>({ photo: null, position: null });
  const form = useForm<SampleFormValues, unknown, SoilSampleCreate>({ resolver: sampleResolver, defaultValues: { kind: 'feel' } });

  const result = classOf(answers);
  const ribbonKey = answers.ribbonCm === undefined ? null : RIBBONS.find((r) => r.cm === answers.ribbonCm)?.key ?? 'typed';

  const answerBall = (balls: boolean) => {
    setAnswers(balls ? { balls } : { balls, ribbonCm: undefined, feel: undefined });
    setStep(balls ? 2 : 4);
  };
  const answerRibbon = (cm: number) => {
    setAnswers((a) => ({ ...a, ribbonCm: cm, feel: cm === 0 ? undefined : a.feel }));
    setStep(cm === 0 ? 4 : 3);
  };
  const typed = Number(typedCm.replace(',', '.'));
  const typedOk = typedCm.trim() !== '' && Number.isFinite(typed) && typed >= 0 && typed <= 30;

  // The answers go into the form, so the shared schema checks them with the other figures.
  useEffect(() => {
    form.setValue('balls', answers.balls);
    form.setValue('ribbonCm', answers.balls ? answers.ribbonCm : undefined);
    form.setValue('feel', answers.balls && answers.ribbonCm ? answers.feel : undefined);
  }, [answers, form]);

  const save = form.handleSubmit((checked) => {
    if (!result?.ok || photoTooBig(extras) || userId === undefined) return;
    const { photo, position } = extras;
    keep.mutate(
      {
        userId,
        fieldId,
        title: `Feel test, ${result.value.textureClass}${checked.label ? ` (${checked.label})` : ''}`,
        input: { ...checked, position, clientKey: crypto.randomUUID() },
        photo: photo ? { blob: photo, name: photo.name, clientKey: crypto.randomUUID() } : null,
      },
      { onSuccess: onDone },
    );
  });

  return (
    <section data-testid="feel-wizard" aria-label="Feel test" className="flex flex-col gap-4 rounded-md border border-paper-edge bg-white/40 p-3">
      <h3 className="text-base font-semibold">Feel test</h3>
      <p className="text-sm text-ink-soft">
        Take a walnut-sized lump of soil from the depth you want to know, pick out stones and roots, and wet it a little at a
        time until it is like putty.
      </p>

      {step === 1 ? (
        <Step n={1} of={3} question="Does moist soil hold together in a ball when squeezed?" picture={<BallDiagram crumbles={answers.balls === false} />}>
          <div className="flex flex-wrap gap-2">
            <Choice selected={answers.balls === true} onClick={() => answerBall(true)} label="Yes, it holds" detail="a ball that keeps its shape" testId="feel-balls-yes" />
            <Choice selected={answers.balls === false} onClick={() => answerBall(false)} label="No, it falls apart" detail="however much water" testId="feel-balls-no" />
          </div>
        </Step>
      ) : null}

      {step === 2 ? (
        <Step n={2} of={3} question="Push it out between thumb and finger into a ribbon: how long before it breaks?" picture={<RibbonDiagram lengthCm={answers.ribbonCm ?? 4} />}>
          <div className="flex flex-wrap gap-2">
            {RIBBONS.map((r) => (
              <Choice key={r.key} selected={ribbonKey === r.key} onClick={() => answerRibbon(r.cm)} label={r.label} detail={r.detail} testId={`feel-ribbon-${r.key}`} />
            ))}
          </div>
          <div className="flex flex-wrap items-end gap-2">
            <label className="flex flex-col gap-1 text-sm font-medium">
              Or the length you measured, cm
              <input
                inputMode="decimal"
                value={typedCm}
                onChange={(e) => setTypedCm(e.target.value)}
                data-testid="feel-ribbon-cm"
                className="num w-28 rounded-md border border-ink-faint bg-white/70 px-3 py-2 text-base"
              />
            </label>
            <Button variant="secondary" disabled={!typedOk} onClick={() => answerRibbon(typed)}>
              Use this length
            </Button>
          </div>
          {typedCm.trim() !== '' && !typedOk ? <p className="text-sm text-alert">Give a length from 0 to 30 cm.</p> : null}
        </Step>
      ) : null}

      {step === 3 ? (
        <Step n={3} of={3} question="Rub a wet pinch between finger and thumb: very gritty, very smooth, or neither?" picture={<PinchDiagram />}>
          <div className="flex flex-wrap gap-2">
            {FEELS.map((f) => (
              <Choice
                key={f.value}
                selected={answers.feel === f.value}
                onClick={() => {
                  setAnswers((a) => ({ ...a, feel: f.value }));
                  setStep(4);
                }}
                label={f.label}
                detail={f.detail}
                testId={`feel-grit-${f.value}`}
              />
            ))}
          </div>
        </Step>
      ) : null}

      {step === 4 && result ? (
        <div className="flex flex-col gap-3">
          {result.ok ? (
            <div className="rounded-md border border-clay bg-clay-light px-3 py-2" data-testid="feel-result" aria-live="polite">
              <p className="text-sm text-ink-soft">
                Answers: {answers.balls ? 'forms a ball' : 'will not ball'}
                {answers.balls ? <span className="num">, ribbon {answers.ribbonCm === 0 ? 'none' : `${fmt(answers.ribbonCm!, 1)} cm (${result.value.ribbon})`}</span> : null}
                {answers.feel ? `, ${FEELS.find((f) => f.value === answers.feel)!.label.toLowerCase()}` : ''}
              </p>
              <p className="text-lg">
                Texture class: <strong className="font-semibold">{result.value.textureClass}</strong>
              </p>
              <p className="text-xs text-ink-soft">by the {result.value.source}</p>
            </div>
          ) : (
            <Notice tone="error">{result.reason}</Notice>
          )}
          <FormProvider {...form}>
            <form noValidate onSubmit={save} className="flex flex-col gap-3" aria-label="Feel test details">
              <p className="text-sm font-semibold text-clay-dark">Anything else you noted (all optional)</p>
              <WhereWhenInputs />
              <DrainageInputs />
              <ChemistryInputs full={false} />
              <FieldExtrasInputs value={extras} onChange={setExtras} />
              {keep.isError ? <Notice tone="error">This browser could not keep the check: {keep.error.message}</Notice> : null}
              <div className="flex flex-wrap gap-2">
                <Button type="submit" disabled={!result.ok || keep.isPending || photoTooBig(extras)} data-testid="feel-save">
                  {keep.isPending ? 'Saving…' : 'Save the feel test'}
                </Button>
                <Button variant="secondary" onClick={() => setStep(1)}>
                  Start the questions again
                </Button>
                <Button variant="quiet" onClick={onDone}>
                  Cancel
                </Button>
              </div>
            </form>
          </FormProvider>
        </div>
      ) : null}

      {step > 1 && step < 4 ? (
        <div className="flex gap-2">
          <Button variant="secondary" size="sm" onClick={() => setStep((s) => (s - 1) as 1 | 2 | 3)}>
            Back
          </Button>
          <Button variant="quiet" size="sm" onClick={onDone}>
            Cancel
          </Button>
        </div>
      ) : step === 1 ? (
        <div>
          <Button variant="quiet" size="sm" onClick={onDone}>
            Cancel
          </Button>
        </div>
      ) : null}
    </section>
  );
}
