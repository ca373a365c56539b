// The fields a landowner owns, as a list of checkboxes.
export type FieldChoice = { id: number; name: string };

export function FieldChecklist({ fields, value, onChange, error, testId }: { fields: FieldChoice[]; value: number[]; onChange: (ids: number[]) => void; error?: string; testId?: string }) {
  return (
    <fieldset className="flex flex-col gap-1" data-testid={testId}>
      <legend className="text-sm font-medium text-ink">Fields that are theirs</legend>
      {fields.length === 0 ? <p className="text-sm text-ink-soft">This farm has no fields yet; draw or import them on the farm map first.</p> : null}
      <div className="flex max-h-48 flex-col gap-1 overflow-y-auto rounded-md border border-paper-edge bg-white/50 p-2">
        {fields.map((f) => (
          <label key={f.id} className="flex items-center gap-2 text-sm">
            <input
              type="checkbox"
              checked={value.includes(f.id)}
              onChange={(e) => onChange(e.target.checked ? [...value, f.id] : value.filter((id) => id !== f.id))}
              data-testid="field-choice"
            />
            {f.name}
          </label>
        ))}
      </div>
      {error ? (
        <p role="alert" className="text-sm text-alert">
          {error}
        </p>
      ) : null}
    </fieldset>
  );
}
