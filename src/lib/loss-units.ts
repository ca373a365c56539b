// The client writes losses as the server's reports do: one definition, in shared/format.
export { lossFigure, runoffFigure, tonnesFigure, volumeFigure, type Figure } from '../../shared/format/loss-units';
