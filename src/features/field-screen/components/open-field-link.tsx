// A link from anywhere a field is shown (the farm map's field details) to its Field screen.
import { Link } from 'react-router-dom';
import { paths } from '../../../lib/paths';

export function OpenFieldLink({ farmId, fieldId, tab, className = '' }: { farmId: number; fieldId: number; tab?: string; className?: string }) {
  return (
    <Link
      to={paths.field.getHref(farmId, fieldId, tab ? { tab } : undefined)}
      data-testid="open-field-screen"
      className={`inline-block font-semibold text-clay-dark underline underline-offset-2 ${className}`}
    >
      Open the Field screen: ground, soil, cropping and risk
    </Link>
  );
}
