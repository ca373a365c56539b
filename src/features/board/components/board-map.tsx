// The board as a choropleth: each field filled with its risk class colour and labelled in words
// (the shared RiskMap); only fields on the board are drawn.
import { useMemo } from 'react';
import type { FieldFeature } from '../../../../shared/schemas/field';
import type { BoardRow } from '../../../../shared/schemas/assessment';
import { RiskMap } from '../../../components/risk/risk-map';

type Props = {
  fields: FieldFeature[];
  rows: BoardRow[];
  selectedId: number | null;
  onSelect: (fieldId: number) => void;
  tileUrl?: string | null;
  tileAttribution?: string | null;
};

export function BoardMap({ fields, rows, selectedId, onSelect, tileUrl, tileAttribution }: Props) {
  const classes = useMemo(() => new Map(rows.map((r) => [r.fieldId, r.riskClass])), [rows]);
  // A landowner's board holds their own fields only.
  const shown = useMemo(() => fields.filter((f) => classes.has(f.id)), [fields, classes]);
  return <RiskMap fields={shown} classes={classes} selectedId={selectedId} onSelect={onSelect} tileUrl={tileUrl} tileAttribution={tileAttribution} testId="board-map" />;
}
