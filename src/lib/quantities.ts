// The client writes each kind of figure as the server's texts do: one definition, in shared/format.
export { formatCount, formatSlope } from '../../shared/format/quantities';
