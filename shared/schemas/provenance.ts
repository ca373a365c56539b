// Where a figure came from, as data: what kind of origin it has and the published work behind
// it. Screens turn it into words; no code reads meaning out of the words.

/** A published work, and where in it. */
export type SourceRef = { title: string; table?: string; page?: string };

export type OriginKind =
  /** A person typed it. */
  | 'typed'
  /** Worked out from other figures (soil samples, the elevation model, a rainfall record). */
  | 'derived'
  /** Taken because nothing was given: an example value to replace with a local figure. */
  | 'default'
  /** Common practice, no single published source. */
  | 'rule-of-thumb'
  /** Looked up in a published table. */
  | 'published-table';

export type Origin = {
  kind: OriginKind;
  source?: SourceRef;
  /** The person who typed it, where known. */
  typedBy?: string;
  /** How it was worked out, in words (e.g. "from the mean of 2 lab samples"). */
  detail?: string;
};

/** "AH-703, table 4-3, p. 12". */
export function sourceWords(s: SourceRef): string {
  return [s.title, s.table ? `table ${s.table}` : null, s.page ? `p. ${s.page}` : null].filter(Boolean).join(', ');
}

/** The origin in plain words, e.g. "typed by Dana Reyes", "rule of thumb", "AH-703, table 4-3". */
export function originWords(o: Origin): string {
  const src = o.source ? sourceWords(o.source) : null;
  switch (o.kind) {
    case 'typed':
      return o.typedBy ? `typed by ${o.typedBy}` : 'typed';
    case 'default':
      return ['example value — replace with your local figure', src].filter(Boolean).join('; ');
    case 'rule-of-thumb':
      return ['rule of thumb', src].filter(Boolean).join(': ');
    case 'published-table':
    case 'derived':
      return src ?? (o.kind === 'derived' ? 'worked out' : 'published table');
  }
}
