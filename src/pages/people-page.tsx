// People: the farm's people and roles; the farmer invites, changes roles and removes. Loaded lazily.
import { useParams } from 'react-router-dom';
import { AppHeader } from '../components/app-header';
import { CannotOpen } from '../components/cannot-open';
import { Notice } from '../components/ui/notice';
import { Loading } from '../components/ui/spinner';
import { UserMenu } from '../features/auth/components/user-menu';
import { useFarm } from '../features/farms/api/get-farm';
import { useFields } from '../features/fields/api/get-fields';
import { usePeople } from '../features/people/api/get-people';
import { InviteForm } from '../features/people/components/invite-form';
import { OpenInvitations } from '../features/people/components/open-invitations';
import { PersonRow } from '../features/people/components/person-row';

export function PeoplePage() {
  const farmId = Number(useParams().farmId);
  const farm = useFarm(farmId);
  const canSee = farm.data && farm.data.role !== 'landowner';
  const people = usePeople(farmId, !!canSee);
  const fields = useFields(farmId);
  const header = <AppHeader screen="People" farmName={farm.data?.name} menu={<UserMenu />} />;

  if (!Number.isInteger(farmId) || farmId <= 0 || farm.isError)
    return <CannotOpen header={header} title="This farm cannot be opened" error={farm.error} notFoundText="There is no such farm, or you are not a member of it." />;
  if (farm.isPending)
    return (
      <div className="flex min-h-full flex-col">
        {header}
        <Loading label="Opening the farm…" />
      </div>
    );
  const isFarmer = farm.data.role === 'farmer';
  const fieldChoices = (fields.data?.features ?? []).map((f) => ({ id: Number(f.id), name: String(f.properties.name) }));

  return (
    <div className="flex min-h-full flex-col">
      {header}
      <main className="mx-auto flex w-full max-w-3xl flex-col gap-5 px-4 py-6">
        <div className="flex flex-col gap-1">
          <h1 className="text-2xl font-semibold">People on {farm.data.name}</h1>
          <p className="text-sm text-ink-soft">
            Who works on this farm and what each may do. {isFarmer ? 'Invite your advisor and your landowners by e-mail; each gets a link that works once.' : 'Only a farmer of this farm invites people or changes roles.'}
          </p>
        </div>
        {!canSee ? (
          <Notice>A landowner sees the farmer and advisor on the farm map, not the list of people.</Notice>
        ) : people.isPending ? (
          <Loading label="Loading the people…" />
        ) : people.isError ? (
          <Notice tone="error" title="The people could not be loaded">
            {people.error.message}
          </Notice>
        ) : (
          <>
            <ul className="flex flex-col rounded-lg border border-paper-edge bg-white/50 px-4" aria-label="People on this farm">
              {people.data.people.map((p) => (
                <PersonRow key={p.membershipId} farmId={farmId} person={p} fields={fieldChoices} canManage={isFarmer} />
              ))}
            </ul>
            {isFarmer ? <OpenInvitations farmId={farmId} invitations={people.data.invitations} /> : null}
            {isFarmer ? <InviteForm farmId={farmId} fields={fieldChoices} /> : null}
          </>
        )}
      </main>
    </div>
  );
}

export default PeoplePage;
