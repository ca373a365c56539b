// The server refused an outline (422 invalid_geometry). Say why, and when it sent a repaired
// shape, let the user take it with one button.
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { isApiError } from '../../../lib/api-client';
import type { AreaGeometry } from '../../../../shared/schemas/geojson';

export type ShapeProblem = {
  message: string;
  /** The outline as drawn and refused, shown on the map while the message is up. */
  drawn: AreaGeometry;
  repaired: AreaGeometry | null;
  /** Save the repaired shape the way the refused one would have been saved. */
  useRepaired: (geometry: AreaGeometry) => void;
};

/** A ShapeProblem from an error, or null when the error is not about the shape's topology. */
export function shapeProblemFrom(
  error: unknown,
  drawn: AreaGeometry,
  useRepaired: ShapeProblem['useRepaired'],
): ShapeProblem | null {
  if (!isApiError(error, 422) || error.code !== 'invalid_geometry') return null;
  const repaired = (error.details as { repaired?: AreaGeometry | null } | undefined)?.repaired ?? null;
  return { message: error.message, drawn, repaired, useRepaired };
}

type Props = { problem: ShapeProblem; pending: boolean; onDismiss: () => void };

export function ShapeProblemNotice({ problem, pending, onDismiss }: Props) {
  return (
    <Notice tone="error" title="This outline cannot be saved as drawn" testId="shape-problem">
      <p>{problem.message}</p>
      <p className="mt-1">
        {problem.repaired
          ? 'On the map, the dashed red line is what was drawn and the filled shape is the repaired outline, with the crossing edges untangled. Save the repaired one, or discard it and draw again.'
          : 'The dashed red line on the map is what was drawn. Draw it again so that no edge crosses another.'}
      </p>
      <div className="mt-2 flex flex-wrap gap-2">
        {problem.repaired ? (
          <Button size="sm" disabled={pending} onClick={() => problem.repaired && problem.useRepaired(problem.repaired)}>
            {pending ? 'Saving…' : 'Use the repaired shape'}
          </Button>
        ) : null}
        <Button size="sm" variant="secondary" onClick={onDismiss}>
          {problem.repaired ? 'Discard and redraw' : 'Dismiss'}
        </Button>
      </div>
    </Notice>
  );
}
