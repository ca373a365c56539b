// A quiet loading line with words, for slow networks out in the field.
export function Loading({ label = 'Loading…' }: { label?: string }) {
  return (
    <p role="status" className="p-6 text-ink-soft">
      {label}
    </p>
  );
}
