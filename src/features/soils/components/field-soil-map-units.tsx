// The soil map units under this field: each unit's share of the field and area, with what the
// map says about it (texture, K, T, soil group, drainage), and how much of the field is mapped.
import { Notice } from '../../../components/ui/notice';
import type { Units } from '../../../../shared/schemas/auth';
import { useFieldSoilMapUnits } from '../api/get-field-soil-map-units';
import { fmt, fmtShare, formatAreaM2, K_US_UNIT, T_US_UNIT } from './format-soil';

const dash = <span className="text-ink-faint">—</span>;

export function FieldSoilMapUnits({ fieldId, units }: { fieldId: number; units: Units }) {
  const q = useFieldSoilMapUnits(fieldId);
  return (
    <section aria-labelledby="field-map-units-heading" className="flex flex-col gap-2" data-testid="field-soil-map-units">
      <h3 id="field-map-units-heading" className="text-base font-semibold">
        Soil map units under this field
      </h3>
      {q.isPending ? (
        <p className="text-sm text-ink-soft">Loading…</p>
      ) : q.isError ? (
        <Notice tone="error">{q.error.message}</Notice>
      ) : q.data.units.length === 0 ? (
        <p className="text-sm text-ink-soft">No soil map units cover this field (or the farm has no soil map yet).</p>
      ) : (
        <>
          <p className="num text-sm">
            {fmtShare(q.data.fieldAreaM2 ? q.data.mappedAreaM2 / q.data.fieldAreaM2 : 0)} of the field is mapped (
            {formatAreaM2(q.data.mappedAreaM2, units)} of {formatAreaM2(q.data.fieldAreaM2, units)}).
          </p>
          <div className="overflow-x-auto rounded-md border border-paper-edge bg-white/40">
            <table className="w-full border-collapse text-sm">
              <thead>
                <tr className="border-b border-paper-edge text-left text-ink-soft">
                  <th scope="col" className="px-2 py-1.5 font-medium">Share of field</th>
                  <th scope="col" className="px-2 py-1.5 font-medium">Area</th>
                  <th scope="col" className="px-2 py-1.5 font-medium">Texture class</th>
                  <th scope="col" className="px-2 py-1.5 font-medium" title={K_US_UNIT}>K, US units</th>
                  <th scope="col" className="px-2 py-1.5 font-medium">T, {T_US_UNIT}</th>
                  <th scope="col" className="px-2 py-1.5 font-medium">Soil group</th>
                  <th scope="col" className="px-2 py-1.5 font-medium">Drainage</th>
                </tr>
              </thead>
              <tbody>
                {q.data.units.map((u) => (
                  <tr key={`${u.unitId}`} className="border-b border-paper-edge last:border-b-0" data-testid="field-soil-map-unit">
                    <td className="num px-2 py-1.5">
                      <span className="flex items-center gap-2">
                        <span className="inline-block h-2.5 w-16 rounded-sm bg-paper-deep" aria-hidden="true">
                          <span className="block h-full rounded-sm bg-clay" style={{ width: `${Math.max(u.share * 100, 1)}%` }} />
                        </span>
                        {fmtShare(u.share)}
                      </span>
                    </td>
                    <td className="num whitespace-nowrap px-2 py-1.5">{formatAreaM2(u.areaM2, units)}</td>
                    <td className="px-2 py-1.5">{u.textureClass ?? dash}</td>
                    <td className="num px-2 py-1.5">{u.kUs !== null ? fmt(u.kUs, 2) : dash}</td>
                    <td className="num px-2 py-1.5">{u.tTonPerAcYr !== null ? fmt(u.tTonPerAcYr, 1) : dash}</td>
                    <td className="px-2 py-1.5">{u.hsg ?? dash}</td>
                    <td className="px-2 py-1.5">{u.drainageClass ?? dash}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <p className="text-xs text-ink-soft">K in {K_US_UNIT}.</p>
        </>
      )}
    </section>
  );
}
