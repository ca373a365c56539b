// Which attribute of the soil map gives which soil figure: texture, K (and its units),
// hydrologic soil group, T and drainage, each picked from the map's attribute names; and how
// many map units the server could read each picked attribute for.
import { useState } from 'react';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { SelectField } from '../../../components/ui/select-field';
import { SOIL_MAP_MEANINGS, type SoilMapInfo, type SoilMapMeaning } from '../../../../shared/schemas/soils';
import { useUpdateSoilMapMapping } from '../api/update-soil-map-mapping';
import { K_SI_UNIT, K_US_UNIT, T_US_UNIT } from './format-soil';

const MEANING_LABELS: Record<SoilMapMeaning, { label: string; hint: string }> = {
  texture: { label: 'Texture class', hint: "class names such as 'silt loam' or 'SiL'" },
  k: { label: 'Erodibility K', hint: 'a number per map unit' },
  hsg: { label: 'Hydrologic soil group', hint: 'A, B, C, D or dual groups such as B/D' },
  t: { label: 'Soil loss tolerance T', hint: `a number in ${T_US_UNIT}` },
  drainage: { label: 'Drainage class', hint: "such as 'poorly drained'" },
};

type Mapping = SoilMapInfo['mapping'];

function Check({ check }: { check: SoilMapInfo['checks'][SoilMapMeaning] }) {
  if (!check) return null;
  const total = check.understood + check.notUnderstood;
  return (
    <p className={`num text-xs ${check.notUnderstood ? 'text-caution' : 'text-ink-soft'}`}>
      read for {check.understood} of {total} map units
      {check.notUnderstood && check.examples.length ? `; not understood: ${check.examples.map((e) => `“${e}”`).join(', ')}` : ''}
    </p>
  );
}

export function SoilMapMappingForm({ farmId, info }: { farmId: number; info: SoilMapInfo }) {
  const save = useUpdateSoilMapMapping(farmId);
  const [mapping, setMapping] = useState<Mapping>(info.mapping);
  const changed = SOIL_MAP_MEANINGS.some((m) => mapping[m] !== info.mapping[m]) || mapping.kUnits !== info.mapping.kUnits;
  const set = (patch: Partial<Mapping>) => {
    save.reset();
    setMapping((m) => ({ ...m, ...patch }));
  };

  return (
    <form
      className="flex flex-col gap-3"
      data-testid="soil-map-mapping"
      aria-label="What the soil map's attributes mean"
      onSubmit={(e) => {
        e.preventDefault();
        save.mutate(mapping);
      }}
    >
      <p className="text-sm text-ink-soft">Pick the attribute that holds each figure; leave one at “not in this map” if the map has none.</p>
      <div className="grid gap-3 sm:grid-cols-2">
        {SOIL_MAP_MEANINGS.map((m) => (
          <div key={m} className="flex flex-col gap-1">
            <SelectField
              label={MEANING_LABELS[m].label}
              hint={MEANING_LABELS[m].hint}
              value={mapping[m] ?? ''}
              onChange={(e) => set({ [m]: e.target.value || null })}
              data-testid={`soil-map-mapping-${m}`}
            >
              <option value="">not in this map</option>
              {info.attributes.map((a) => (
                <option key={a.name} value={a.name}>
                  {a.name}
                  {a.sampleValues.length ? ` (e.g. ${a.sampleValues.slice(0, 3).join(', ')})` : ''}
                </option>
              ))}
            </SelectField>
            {mapping[m] === info.mapping[m] ? <Check check={info.checks[m]} /> : null}
            {m === 'k' && mapping.k ? (
              <fieldset className="flex flex-col gap-1" data-testid="soil-map-k-units">
                <legend className="text-sm font-medium text-ink">K is given in</legend>
                <div className="flex flex-wrap gap-1">
                  {(['us', 'si'] as const).map((u) => (
                    <label key={u} className="cursor-pointer">
                      <input type="radio" name="kUnits" value={u} checked={mapping.kUnits === u} onChange={() => set({ kUnits: u })} className="peer sr-only" />
                      <span className="inline-block rounded-md border border-ink-faint bg-paper px-2.5 py-1 text-sm font-medium text-ink hover:bg-paper-deep peer-checked:border-clay-dark peer-checked:bg-clay peer-checked:text-paper peer-focus-visible:outline peer-focus-visible:outline-3 peer-focus-visible:outline-offset-2 peer-focus-visible:outline-ink">
                        {u === 'us' ? 'US units' : 'SI units'}
                      </span>
                    </label>
                  ))}
                </div>
              </fieldset>
            ) : null}
            {m === 'k' && mapping.k ? (
              <p className="text-xs text-ink-soft">
                US: {K_US_UNIT} (soil surveys, about 0.02–0.69). SI: {K_SI_UNIT}.
              </p>
            ) : null}
          </div>
        ))}
      </div>
      {save.isError ? <Notice tone="error">{save.error.message}</Notice> : null}
      {save.isSuccess && !changed ? <Notice tone="info">Saved. Each field's soil figures now use this.</Notice> : null}
      <div>
        <Button type="submit" disabled={!changed || save.isPending} data-testid="soil-map-mapping-save">
          {save.isPending ? 'Saving…' : 'Save what the attributes mean'}
        </Button>
      </div>
    </form>
  );
}
