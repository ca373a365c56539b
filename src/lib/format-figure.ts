// The client writes figures as the server's reports do: one definition, in shared/format.
export { formatFigure } from '../../shared/format/figure';
