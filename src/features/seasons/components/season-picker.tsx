// Which season the screen shows, and for a farmer a small form to add one ("2028"), starting
// with the last season's cropping when wanted, and a way to delete an empty season.
import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { SeasonLabel, type Season } from '../../../../shared/schemas/season';
import { useCreateSeason } from '../api/create-season';
import { useDeleteSeason } from '../api/delete-season';

type Props = {
  farmId: number;
  seasons: Season[];
  season: string | null;
  onChange: (label: string) => void;
  canAdd: boolean;
};

/** The label a new season most likely gets: the year after the newest numeric one. */
const nextLabel = (seasons: Season[]) => {
  const years = seasons.map((s) => Number(s.label)).filter((n) => Number.isInteger(n) && n > 1900);
  return years.length ? String(Math.max(...years) + 1) : String(new Date().getFullYear());
};

export function SeasonPicker({ farmId, seasons, season, onChange, canAdd }: Props) {
  const [adding, setAdding] = useState(false);
  const [label, setLabel] = useState('');
  const [error, setError] = useState<string | null>(null);
  const [copy, setCopy] = useState(true);
  const create = useCreateSeason(farmId);
  const remove = useDeleteSeason(farmId);
  // The newest season with cropping: what a new season most likely repeats.
  const source = seasons.find((s) => (s.croppedFields ?? 0) > 0);
  const shown = seasons.find((s) => s.label === season);

  const submit = (e: FormEvent) => {
    e.preventDefault();
    const parsed = SeasonLabel.safeParse(label);
    if (!parsed.success) {
      setError(parsed.error.issues[0].message.replace(/^season/, 'The season'));
      return;
    }
    setError(null);
    create.mutate({ label: parsed.data, ...(copy && source ? { copyCroppingFrom: source.label } : {}) }, {
      onSuccess: (s) => {
        onChange(s.label);
        setAdding(false);
      },
      onError: (err) => setError(err.message),
    });
  };

  return (
    <div className="flex flex-wrap items-end gap-2" data-testid="season-picker">
      <label className="flex flex-col gap-1 text-sm font-medium">
        Season
        <select
          className="num rounded-md border border-ink-faint bg-white/70 px-3 py-1.5 text-base"
          value={season ?? ''}
          onChange={(e) => onChange(e.target.value)}
          disabled={seasons.length === 0}
          data-testid="season-select"
        >
          {seasons.length === 0 ? <option value="">No season yet</option> : null}
          {seasons.map((s) => (
            <option key={s.id} value={s.label}>
              {s.label}
              {s.empty ? ' (empty)' : ''}
            </option>
          ))}
        </select>
      </label>
      {canAdd && !adding ? (
        <Button
          variant="secondary"
          size="sm"
          className="mb-1"
          data-testid="season-add"
          onClick={() => {
            setLabel(nextLabel(seasons));
            setAdding(true);
          }}
        >
          Add a season
        </Button>
      ) : null}
      {canAdd && !adding && shown?.empty ? (
        <Button
          variant="quiet"
          size="sm"
          className="mb-1"
          data-testid="season-delete"
          disabled={remove.isPending}
          onClick={() => {
            if (!window.confirm(`Delete season ${shown.label}? It holds no cropping and no plan.`)) return;
            remove.mutate(shown.label, {
              onSuccess: () => {
                const next = seasons.find((s) => s.label !== shown.label && s.current) ?? seasons.find((s) => s.label !== shown.label);
                if (next) onChange(next.label);
              },
              onError: (err) => setError(err.message),
            });
          }}
        >
          Delete this empty season
        </Button>
      ) : null}
      {adding ? (
        <form onSubmit={submit} className="flex flex-wrap items-end gap-2" aria-label="Add a season">
          <label className="flex flex-col gap-1 text-sm font-medium">
            New season
            <input
              className="num w-28 rounded-md border border-ink-faint bg-white/70 px-3 py-1.5 text-base"
              value={label}
              onChange={(e) => setLabel(e.target.value)}
              data-testid="season-new-label"
              autoFocus
            />
          </label>
          {source ? (
            <label className="mb-1.5 flex items-center gap-1.5 text-sm">
              <input type="checkbox" checked={copy} onChange={(e) => setCopy(e.target.checked)} data-testid="season-copy-cropping" />
              Start with the cropping of {source.label}
            </label>
          ) : null}
          <Button type="submit" size="sm" className="mb-1" disabled={create.isPending} data-testid="season-create">
            {create.isPending ? 'Adding…' : 'Add'}
          </Button>
          <Button variant="quiet" size="sm" className="mb-1" onClick={() => setAdding(false)}>
            Cancel
          </Button>
        </form>
      ) : null}
      {error ? (
        <p role="alert" className="w-full text-sm text-alert">
          {error}
        </p>
      ) : null}
    </div>
  );
}
