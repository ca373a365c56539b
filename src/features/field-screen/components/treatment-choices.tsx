// The what-if's switches: one choice per family that excludes itself (tillage, support practice,
// wet ground), a tick for each treatment that adds on. A treatment the field cannot take yet is
// greyed out; the list under the options says why and what it needs.
import { useId } from 'react';
import type { TreatmentKey, TreatmentSite, Unavailable } from '../../../../shared/erosion/treatments/types';

type Group = { label: string; keys: TreatmentKey[]; one: boolean };

const GROUPS: Group[] = [
  { label: 'Tillage', keys: ['reduced-till', 'no-till'], one: true },
  { label: 'Cover', keys: ['cover-crop'], one: false },
  { label: 'Support practice', keys: ['contour-farming', 'strip-cropping', 'terraces'], one: true },
  { label: 'Where water runs', keys: ['grassed-waterway', 'filter-strip'], one: false },
  { label: 'Amending the soil', keys: ['lime', 'gypsum', 'organic-matter'], one: false },
  { label: 'Wet or problem ground', keys: ['raised-beds', 'drainage', 'permanent-cover'], one: true },
];

/** The keys with `key` switched on or off; within a one-of family the others go off. */
export function toggleKey(chosen: TreatmentKey[], key: TreatmentKey, on: boolean): TreatmentKey[] {
  const family = GROUPS.find((g) => g.keys.includes(key));
  const rest = chosen.filter((k) => k !== key && !(on && family?.one && family.keys.includes(k)));
  return on ? [...rest, key] : rest;
}

function asNow(group: Group, site: TreatmentSite): string {
  const { c, p } = site.input;
  if (group.label === 'Tillage') return c.from === 'table' && c.tillage ? `As now (${c.tillage})` : 'As now';
  if (group.label === 'Support practice') return p?.from === 'practice' && p.practice !== 'none' ? `As now (${p.practice})` : 'As now (none)';
  return 'None';
}

type Props = {
  site: TreatmentSite;
  titles: Record<TreatmentKey, string>;
  unavailable: Unavailable[];
  chosen: TreatmentKey[];
  onChange: (keys: TreatmentKey[]) => void;
};

function Choice({ group, k, props, name }: { group: Group; k: TreatmentKey; props: Props; name: string }) {
  const why = props.unavailable.find((u) => u.key === k);
  const on = props.chosen.includes(k);
  return (
    <label className={`flex items-start gap-2 ${why ? 'text-ink-faint' : 'cursor-pointer'}`} data-testid={`whatif-${k}`}>
      <input
        type={group.one ? 'radio' : 'checkbox'}
        name={group.one ? name : undefined}
        className="mt-1 accent-clay"
        checked={on}
        disabled={Boolean(why)}
        onChange={(e) => props.onChange(toggleKey(props.chosen, k, e.target.checked))}
      />
      <span className="flex flex-col">
        <span className="font-medium">{props.titles[k]}</span>
        {why ? (
          <span className="text-xs text-ink-soft" title={why.reason}>
            not offered here: why is under “Not offered on this field”
          </span>
        ) : null}
      </span>
    </label>
  );
}

export function TreatmentChoices(props: Props) {
  const base = useId();
  return (
    <div className="grid items-start gap-3 sm:grid-cols-2 xl:grid-cols-3" data-testid="whatif-choices">
      {GROUPS.map((g, i) => {
        const name = `${base}-${i}`;
        const noneOn = !g.keys.some((k) => props.chosen.includes(k));
        return (
          <fieldset key={g.label} className="flex flex-col gap-1 rounded-md border border-paper-edge bg-paper px-3 py-2 text-sm">
            <legend className="px-1 text-xs font-semibold uppercase tracking-wide text-clay-dark">{g.label}</legend>
            {g.one ? (
              <label className="flex cursor-pointer items-center gap-2">
                <input
                  type="radio"
                  name={name}
                  className="accent-clay"
                  checked={noneOn}
                  onChange={() => props.onChange(props.chosen.filter((k) => !g.keys.includes(k)))}
                />
                <span className="text-ink-soft">{asNow(g, props.site)}</span>
              </label>
            ) : null}
            {g.keys.map((k) => (
              <Choice key={k} group={g} k={k} props={props} name={name} />
            ))}
          </fieldset>
        );
      })}
    </div>
  );
}
