// The include that reads the name of whoever last changed a record (the `editor` association of
// cropping, ground and climate rows), for "last changed by … on …".
import { User } from './user.model';

export const withEditor = { model: User, as: 'editor', attributes: ['name'] };

/** A row read with withEditor. */
export type Edited = { editor?: User | null; updatedAt: Date };
