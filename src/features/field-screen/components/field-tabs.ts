// The Field screen's tabs, kept in the URL (?tab=risk) so a link opens the same tab.
import { useCallback } from 'react';
import { useSearchParams } from 'react-router-dom';

export const FIELD_TABS = [
  { key: 'outline', label: 'Outline' },
  { key: 'ground', label: 'Ground' },
  { key: 'soil', label: 'Soil' },
  { key: 'cropping', label: 'Cropping' },
  { key: 'risk', label: 'Risk' },
] as const;

export type FieldTab = (typeof FIELD_TABS)[number]['key'];

const isTab = (x: string | null): x is FieldTab => FIELD_TABS.some((t) => t.key === x);

export function useFieldTab(): [FieldTab, (tab: FieldTab) => void] {
  const [params, setParams] = useSearchParams();
  const raw = params.get('tab');
  const tab: FieldTab = isTab(raw) ? raw : 'outline';
  const setTab = useCallback(
    (next: FieldTab) =>
      setParams(
        (p) => {
          const q = new URLSearchParams(p);
          q.set('tab', next);
          return q;
        },
        { replace: true },
      ),
    [setParams],
  );
  return [tab, setTab];
}
