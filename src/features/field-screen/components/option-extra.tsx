// A slot beside each treatment option on the Risk tab, filled by the page (the Field page puts
// "Add to the plan" there), so this feature does not reach into another one.
import { createContext, useContext, type ReactNode } from 'react';
import type { TreatmentOption } from '../../../../shared/erosion/treatments/types';

export type OptionExtra = (ctx: { fieldId: number; season: string; option: TreatmentOption }) => ReactNode;

export const OptionExtraContext = createContext<OptionExtra | null>(null);

/** What the page puts beside an option (nothing when it gave no slot). */
export function OptionExtraSlot({ fieldId, season, option }: { fieldId: number; season: string; option: TreatmentOption }) {
  const extra = useContext(OptionExtraContext);
  return extra ? <>{extra({ fieldId, season, option })}</> : null;
}
