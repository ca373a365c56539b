// A calm notice for ground that amendments will not fix: gray or mottled subsoil near the
// surface means a seasonal high water table.
import { Notice } from '../../../components/ui/notice';
import { fmtCm } from './format-soil';

export function NotWorthAmendingNotice({ depthToGrayCm, drainageClass }: { depthToGrayCm: number | null; drainageClass: string | null }) {
  return (
    <Notice tone="info" title="Amending will not fix this ground" testId="not-worth-amending">
      <p>
        {depthToGrayCm !== null ? (
          <>
            Gray or mottled colours show at <span className="num">{fmtCm(depthToGrayCm)}</span>
          </>
        ) : (
          'Gray or mottled colours show close to the surface'
        )}
        {drainageClass ? ` (${drainageClass})` : ''}: water stands in this soil for part of the year, and gypsum,
        lime or organic matter will not change that.
      </p>
      <p className="mt-1">What works here instead:</p>
      <ul className="list-inside list-disc">
        <li>raised or no-dig beds, built up above the wet layer;</li>
        <li>permanent cover, such as grass or hay, that holds the soil all year;</li>
        <li>drainage, designed to local standards by a qualified person.</li>
      </ul>
      <p className="mt-1">Before any digging or drain laying, have buried utilities located and marked.</p>
    </Notice>
  );
}
