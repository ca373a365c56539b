// The client writes areas and lengths as the server's reports do: one definition, in shared/format.
export { formatArea, formatLength, UNIT_LABELS } from '../../shared/format/units';
