// Who last changed a record and when, from a row read with its editor (models/with-editor).
import type { LastChange } from '../../shared/schemas/season';
import type { Edited } from '../models/with-editor';

/** The editor's name (null when not read or since removed) and the row's last change time. */
export const lastChangeOf = (row: object): LastChange => {
  const r = row as Edited;
  return { by: r.editor?.name ?? null, at: new Date(r.updatedAt).toISOString() };
};
