// Field: one field of a farm with its tabs (Outline, Ground, Soil, Cropping, Risk). Loaded
// lazily (Leaflet and the charts are large).
import { useParams } from 'react-router-dom';
import { AppHeader } from '../components/app-header';
import { CannotOpen } from '../components/cannot-open';
import { Loading } from '../components/ui/spinner';
import { useMe } from '../features/auth/api/get-me';
import { UserMenu } from '../features/auth/components/user-menu';
import { useFarm } from '../features/farms/api/get-farm';
import { useFields } from '../features/fields/api/get-fields';
import { FieldScreen } from '../features/field-screen/components/field-screen';
import type { OptionExtra } from '../features/field-screen/components/option-extra';
import { AddOptionButton } from '../features/plans/components/add-option-button';

export function FieldPage() {
  const params = useParams();
  const farmId = Number(params.farmId);
  const fieldId = Number(params.fieldId);
  const farm = useFarm(farmId);
  const me = useMe();
  const fields = useFields(farmId);
  const fieldName = fields.data?.features.find((f) => f.id === fieldId)?.properties.name;
  const header = <AppHeader screen={fieldName ?? 'Field'} farmName={farm.data?.name} role={farm.data?.role} menu={<UserMenu />} />;
  // Beside each treatment option on the Risk tab: add it to the season's plan in one click.
  const optionExtra: OptionExtra = ({ fieldId: id, season, option }) => <AddOptionButton farmId={farmId} season={season} fieldId={id} optionId={option.id} />;
  const bad = !Number.isInteger(farmId) || farmId <= 0 || !Number.isInteger(fieldId) || fieldId <= 0;

  if (bad || farm.isError)
    return <CannotOpen header={header} title="This field cannot be opened" error={farm.error} notFoundText="There is no such farm or field, or you are not a member of the farm." />;

  return (
    <div className="flex h-full flex-col">
      {header}
      {farm.isPending || !me.data ? <Loading label="Opening the field…" /> : <FieldScreen key={fieldId} farm={farm.data} fieldId={fieldId} units={me.data.units} optionExtra={optionExtra} />}
    </div>
  );
}

export default FieldPage;
