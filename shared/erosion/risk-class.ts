// Risk classes from A/T, the ratio of estimated loss to the soil-loss tolerance T
// (NSSH part 618: rank fields by A/T). The class limits and names are Fieldshed's own
// (common practice, no single source); colours are ColorBrewer YlOrBr, 5 classes.
export type RiskClass = { key: 'holding' | 'near-limit' | 'losing' | 'losing-fast' | 'severe'; label: string; colour: string; maxAOverT: number | null };

export const RISK_CLASSES: readonly RiskClass[] = Object.freeze([
  { key: 'holding', label: 'Holding: well under T', colour: '#ffffd4', maxAOverT: 0.5 },
  { key: 'near-limit', label: 'Near the limit', colour: '#fed98e', maxAOverT: 1 },
  { key: 'losing', label: 'Losing soil: above T', colour: '#fe9929', maxAOverT: 2 },
  { key: 'losing-fast', label: 'Losing fast: 2–4 × T', colour: '#d95f0e', maxAOverT: 4 },
  { key: 'severe', label: 'Severe: over 4 × T', colour: '#993404', maxAOverT: null },
]);

export function riskClassOf(aOverT: number): RiskClass {
  if (!Number.isFinite(aOverT) || aOverT < 0) throw new Error(`aOverT must be a finite number >= 0, got ${aOverT}`);
  return RISK_CLASSES.find((c) => c.maxAOverT === null || aOverT < c.maxAOverT)!;
}
