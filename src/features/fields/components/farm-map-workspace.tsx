// Farm map: the map filling the screen with the field panel beside it (on a phone, in a sheet
// over the foot of the map). Holds the selection and turns map gestures (draw, edit, remove)
// into mutations; the query cache redraws the map.
import { useCallback, useState, type ReactNode } from 'react';
import type { Layer } from 'leaflet';
import { BottomSheet } from '../../../components/ui/bottom-sheet';
import { Button } from '../../../components/ui/button';
import { Notice } from '../../../components/ui/notice';
import { Loading } from '../../../components/ui/spinner';
import { layerToGeometry } from '../../../lib/geo-leaflet';
import { useNarrowScreen } from '../../../lib/use-narrow-screen';
import { formatArea } from '../../../lib/units';
import type { Units } from '../../../../shared/schemas/auth';
import type { FieldFeature } from '../../../../shared/schemas/field';
import type { AreaGeometry } from '../../../../shared/schemas/geojson';
import { useCreateField } from '../api/create-field';
import { useDeleteField } from '../api/delete-field';
import { useFields } from '../api/get-fields';
import { useUpdateField } from '../api/update-field';
import { fieldEditErrorMessage } from './conflict-message';
import { FieldDetails } from './field-details';
import { FieldList } from './field-list';
import { EmptyMapHint } from './empty-map-hint';
import { FieldsMap } from './fields-map';
import { ImportDialog } from './import-dialog';
import type { FocusRequest } from './map-view-control';
import { ShapeProblemNotice, shapeProblemFrom, type ShapeProblem } from './shape-problem';

type MapMessage = { tone: 'error' | 'caution' | 'info'; text: string } | null;

type Props = {
  farmId: number;
  farmBbox: [number, number, number, number] | null;
  canEdit: boolean;
  units: Units;
  /** Role notes shown at the top of the panel. */
  banner?: ReactNode;
  /** More map layers (the basemap, place search, other features' overlays), given the selected field. */
  mapLayers?: (selected: FieldFeature | null) => ReactNode;
  /** More of the selected field's details, under its own. */
  fieldExtra?: (field: FieldFeature) => ReactNode;
  /** Farm-wide sections at the foot of the panel. */
  panelSections?: ReactNode;
};

const overlapText = (field: FieldFeature, units: Units) =>
  field.properties.overlaps.length
    ? ` It overlaps ${field.properties.overlaps.map((o) => `${o.name} (${formatArea(o.areaHa, units)})`).join(', ')}.`
    : '';

export function FarmMapWorkspace(props: Props) {
  const { farmId, farmBbox, canEdit, units, banner } = props;
  const fields = useFields(farmId);
  const createField = useCreateField(farmId);
  const updateField = useUpdateField(farmId);
  const deleteField = useDeleteField(farmId);

  const [selectedId, setSelectedId] = useState<number | null>(null);
  const [focus, setFocus] = useState<FocusRequest>(null);
  const [importOpen, setImportOpen] = useState(false);
  const [message, setMessage] = useState<MapMessage>(null);
  const [shapeProblem, setShapeProblem] = useState<ShapeProblem | null>(null);
  const [layerEpoch, setLayerEpoch] = useState(0);
  const narrow = useNarrowScreen();
  const [sheetOpen, setSheetOpen] = useState(false);
  const redrawFromCache = () => setLayerEpoch((n) => n + 1);

  const features = fields.data?.features ?? [];
  const selected = features.find((f) => f.id === selectedId) ?? null;
  const findField = (fieldId: number) => fields.data?.features.find((f) => f.id === fieldId);

  const saveNew = (geometry: AreaGeometry) => {
    setMessage(null);
    setShapeProblem(null);
    createField.mutate(
      { type: 'Feature', geometry, properties: {} },
      {
        onSuccess: (field) => {
          setSelectedId(field.id);
          setMessage({
            tone: field.properties.overlaps.length ? 'caution' : 'info',
            text: `Saved ${field.properties.name}, ${formatArea(field.properties.areaHa, units)}.${overlapText(field, units)}`,
          });
        },
        onError: (error) => {
          const problem = shapeProblemFrom(error, geometry, saveNew);
          if (problem) setShapeProblem(problem);
          else setMessage({ tone: 'error', text: `The new field was not saved: ${error.message}` });
        },
      },
    );
  };

  // mutateAsync, not mutate: several outlines can be saved at once when edit mode ends, and
  // each answer must reach its own handler.
  const saveOutline = (fieldId: number, geometry: AreaGeometry) => {
    const field = findField(fieldId);
    if (!field) return;
    setMessage(null);
    setShapeProblem(null);
    updateField.mutateAsync({ fieldId, input: { version: field.properties.version, geometry } }).then(
      (saved) =>
        setMessage({
          tone: saved.properties.overlaps.length ? 'caution' : 'info',
          text: `Saved the new outline of ${saved.properties.name}, ${formatArea(saved.properties.areaHa, units)}.${overlapText(saved, units)}`,
        }),
      (error: unknown) => {
        // Whatever happened, the map goes back to what the server holds.
        redrawFromCache();
        const problem = shapeProblemFrom(error, geometry, (repaired) => saveOutline(fieldId, repaired));
        if (problem) setShapeProblem(problem);
        else setMessage({ tone: 'error', text: `${field.properties.name}: ${fieldEditErrorMessage(error, 'new outline')}` });
      },
    );
  };

  const onEdited = (fieldId: number, layer: Layer) => {
    const geometry = layerToGeometry(layer);
    if (geometry) saveOutline(fieldId, geometry);
  };

  const onRemoved = (fieldId: number) => {
    const name = findField(fieldId)?.properties.name ?? 'The field';
    setMessage(null);
    if (selectedId === fieldId) setSelectedId(null);
    deleteField.mutateAsync(fieldId).then(
      () => setMessage({ tone: 'info', text: `Deleted ${name}.` }),
      (error: unknown) => {
        redrawFromCache();
        setMessage({ tone: 'error', text: `${name} was not deleted: ${fieldEditErrorMessage(error, 'deletion')}` });
      },
    );
  };

  const selectFromList = (fieldId: number) => {
    setSelectedId(fieldId);
    setFocus((f) => ({ fieldId, seq: (f?.seq ?? 0) + 1 }));
  };
  // On a phone, a field tapped on the map opens the sheet at its details.
  const selectOnMap = (fieldId: number | null) => {
    setSelectedId(fieldId);
    if (fieldId !== null) setSheetOpen(true);
  };
  const closeImport = useCallback(() => setImportOpen(false), []);

  const saving = createField.isPending || updateField.isPending || deleteField.isPending;

  const panel = (
    <>
      {banner}
      {canEdit ? (
        <div className="flex flex-col gap-2">
          <Button data-testid="import-button" className="self-start" onClick={() => setImportOpen(true)}>
            Import outlines from a file
          </Button>
          <p className="text-sm text-ink-soft">
            Or draw on the map: pick the polygon tool at the top left, click each corner, and click the first corner
            again to finish. The edit tool below it lets you drag corners; pick it again to save. The eraser
            removes the field you click.
          </p>
        </div>
      ) : null}
      {selected ? (
        <FieldDetails
          key={selected.id}
          field={selected}
          units={units}
          canEdit={canEdit}
          onClose={() => setSelectedId(null)}
          onDeleted={() => {
            setMessage({ tone: 'info', text: `Deleted ${selected.properties.name}.` });
            setSelectedId(null);
          }}
        >
          {props.fieldExtra?.(selected)}
        </FieldDetails>
      ) : null}
      {fields.data ? (
        <FieldList fields={features} units={units} selectedId={selectedId} onSelect={selectFromList} />
      ) : null}
      {props.panelSections}
    </>
  );

  return (
    <div className={narrow ? 'relative min-h-0 flex-1 overflow-hidden' : 'flex min-h-0 flex-1 flex-col overflow-y-auto lg:flex-row lg:overflow-hidden'}>
      <div className={narrow ? 'absolute inset-x-0 bottom-14 top-0' : 'relative h-[60vh] min-h-[320px] shrink-0 lg:h-auto lg:flex-1'} data-testid="farm-map">
        {fields.isPending ? (
          <Loading label="Loading the farm's fields…" />
        ) : fields.isError ? (
          <div className="p-4">
            <Notice tone="error" title="The fields could not be loaded">
              {fields.error.message}
            </Notice>
          </div>
        ) : (
          <FieldsMap
            fields={features}
            farmBbox={farmBbox}
            selectedId={selectedId}
            focus={focus}
            canEdit={canEdit}
            layerEpoch={layerEpoch}
            preview={shapeProblem ? { drawn: shapeProblem.drawn, repaired: shapeProblem.repaired } : null}
            onSelect={selectOnMap}
            onEdited={onEdited}
            onRemoved={onRemoved}
            onCreate={saveNew}
            onDrawError={(text) => setMessage({ tone: 'error', text })}
          >
            {props.mapLayers?.(selected)}
            {features.length === 0 ? <EmptyMapHint canEdit={canEdit} /> : null}
          </FieldsMap>
        )}
        <div className="pointer-events-none absolute inset-x-0 top-2 z-[1000] flex flex-col items-center gap-2 px-14">
          {saving ? (
            <p role="status" className="pointer-events-auto rounded bg-paper px-3 py-1 text-sm shadow">
              Saving…
            </p>
          ) : null}
          {shapeProblem ? (
            <div className="pointer-events-auto w-full max-w-md shadow">
              <ShapeProblemNotice
                problem={shapeProblem}
                pending={saving}
                onDismiss={() => setShapeProblem(null)}
              />
            </div>
          ) : null}
          {message ? (
            <div className="pointer-events-auto w-full max-w-md shadow" data-testid="map-message">
              <Notice tone={message.tone}>
                <div className="flex items-start gap-2">
                  <p className="flex-1">{message.text}</p>
                  <button type="button" className="text-xs underline" onClick={() => setMessage(null)}>
                    Dismiss
                  </button>
                </div>
              </Notice>
            </div>
          ) : null}
        </div>
      </div>

      {narrow ? (
        <BottomSheet
          label="Fields of this farm"
          summary={selected ? `${selected.properties.name} · ${features.length} fields` : `Fields of this farm (${features.length})`}
          open={sheetOpen}
          onOpenChange={setSheetOpen}
          testId="field-sheet"
        >
          <div className="flex flex-col gap-4 p-4">{panel}</div>
        </BottomSheet>
      ) : (
        <aside
          aria-label="Fields of this farm"
          className="flex w-full shrink-0 flex-col gap-4 border-t border-paper-edge bg-paper p-4 lg:w-96 lg:overflow-y-auto lg:border-l lg:border-t-0"
        >
          {panel}
        </aside>
      )}

      {importOpen ? (
        <ImportDialog farmId={farmId} units={units} onClose={closeImport} />
      ) : null}
    </div>
  );
}
