// "Add to the plan": a field's treatment option into the season's plan in one click (one action
// per treatment it combines), with a link to the plan once it is there. The season's plan is
// started when it has none.
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { Button } from '../../../components/ui/button';
import { paths } from '../../../lib/paths';
import { useAddOptionToPlan } from '../api/add-option-to-plan';

type Props = { farmId: number; season: string; fieldId: number; optionId: string; size?: 'sm' | 'md' };

export function AddOptionButton({ farmId, season, fieldId, optionId, size = 'sm' }: Props) {
  const add = useAddOptionToPlan(farmId, season);
  const [added, setAdded] = useState(false);
  if (added)
    return (
      <span className="text-sm" data-testid="option-added">
        <span className="font-semibold">In the {season} plan.</span>{' '}
        <Link to={paths.plan.getHref(farmId, season)} className="font-semibold text-clay-dark underline underline-offset-2" data-testid="option-open-plan">
          Open the plan
        </Link>
      </span>
    );
  return (
    <span className="flex flex-col gap-1">
      <Button variant="secondary" size={size} disabled={add.isPending} onClick={() => add.mutate({ fieldId, optionId }, { onSuccess: () => setAdded(true) })} data-testid="option-add-to-plan">
        {add.isPending ? 'Adding…' : `Add to the ${season} plan`}
      </Button>
      {add.isError ? (
        <span role="alert" className="text-sm text-alert">
          {add.error.message}
        </span>
      ) : null}
    </span>
  );
}
