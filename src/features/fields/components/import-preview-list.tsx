// The features of a file under preview, one row each: a tick box, its number and name, its area,
// what the user should know in plain words, and for a repaired outline a one-click acceptance.
import type { Units } from '../../../../shared/schemas/auth';
import type { PreviewFeature } from '../../../../shared/schemas/field-import';
import { Button } from '../../../components/ui/button';
import { formatArea } from '../../../lib/units';
import { isRepaired, previewName, warningWords } from './import-warning-words';

type Props = {
  features: PreviewFeature[];
  nameAttribute: string | null;
  ticked: ReadonlySet<number>;
  units: Units;
  onTick: (index: number, on: boolean) => void;
  onShow: (index: number) => void;
};

function FeatureRow({ feature, name, ticked, units, onTick, onShow }: Omit<Props, 'features' | 'nameAttribute' | 'ticked'> & {
  feature: PreviewFeature;
  name: string | null;
  ticked: boolean;
}) {
  const checkboxId = `import-feature-${feature.index}`;
  const repaired = isRepaired(feature);
  const title = name ?? 'No name — it will be numbered';
  return (
    <li data-testid="import-feature" data-index={feature.index} className="flex flex-col gap-1 border-b border-paper-edge py-2 last:border-b-0">
      <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
        {feature.geometry ? (
          <input
            id={checkboxId}
            type="checkbox"
            className="h-5 w-5 accent-clay"
            checked={ticked}
            onChange={(e) => onTick(feature.index, e.target.checked)}
          />
        ) : (
          <span className="h-5 w-5" aria-hidden />
        )}
        <label htmlFor={feature.geometry ? checkboxId : undefined} className="flex min-w-0 flex-1 items-baseline gap-2">
          <span className="num text-ink-soft">{feature.index}.</span>
          <span data-testid="import-feature-name" className={`truncate font-medium ${name ? '' : 'italic text-ink-soft'}`}>
            {title}
          </span>
        </label>
        {feature.areaHa !== null ? <span className="num text-sm">{formatArea(feature.areaHa, units)}</span> : null}
        {feature.geometry ? (
          <Button size="sm" variant="quiet" onClick={() => onShow(feature.index)} aria-label={`Show feature ${feature.index} on the map`}>
            Show
          </Button>
        ) : null}
      </div>
      {feature.problem ? (
        <p className="ml-8 text-sm text-alert">Cannot be imported: {feature.problem}</p>
      ) : null}
      {feature.warnings.length ? (
        <ul className="ml-8 flex flex-col gap-0.5 text-sm text-ink-soft" data-testid="import-feature-warnings">
          {feature.warnings.map((w, i) => (
            <li key={i}>{warningWords(w, units)}</li>
          ))}
        </ul>
      ) : null}
      {repaired && !ticked ? (
        <div className="ml-8">
          <Button size="sm" variant="secondary" onClick={() => onTick(feature.index, true)}>
            Accept the repaired outline
          </Button>
        </div>
      ) : null}
    </li>
  );
}

export function ImportPreviewList({ features, nameAttribute, ticked, units, onTick, onShow }: Props) {
  return (
    <ul className="flex flex-col" aria-label="Features in the file">
      {features.map((f) => (
        <FeatureRow
          key={f.index}
          feature={f}
          name={previewName(f, nameAttribute)}
          ticked={ticked.has(f.index)}
          units={units}
          onTick={onTick}
          onShow={onShow}
        />
      ))}
    </ul>
  );
}
