// The Field screen's Soil tab: the field's soil summary, its samples, the triangle chart,
// CSV upload, profile photos and the soil map units under the field.
import { Notice } from '../../../components/ui/notice';
import { useSoilSummary } from '../api/get-soil-summary';

export type SoilTabProps = { fieldId: number; farmId: number; role: 'farmer' | 'advisor' | 'landowner' };

export function SoilTab({ fieldId }: SoilTabProps) {
  const summary = useSoilSummary(fieldId);
  return (
    <div className="flex flex-col gap-4" data-testid="soil-tab">
      <section data-testid="soil-summary" className="rounded-md border border-paper-edge bg-white/40 p-3">
        <h2 className="text-lg font-semibold">Soil of this field</h2>
        {summary.isPending ? (
          <p className="text-sm text-ink-soft">Loading…</p>
        ) : summary.isError ? (
          <Notice tone="error">{summary.error.message}</Notice>
        ) : (
          <p className="text-sm">
            Texture class: {summary.data.textureClass ?? 'not known yet'}
          </p>
        )}
      </section>
    </div>
  );
}
