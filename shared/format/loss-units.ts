// How the board and the Field screen write soil loss, tonnes and runoff: the figure in the
// user's units first (t/ha/yr for hectare users, US t/ac/yr for acre users) and the other
// beside it; runoff in mm (inches beside for acre users).
import { mmToIn, tPerHaToTonPerAc, tToShortTon } from '../erosion/units';
import type { Units } from '../schemas/auth';
import { formatFigure } from './figure';
import { M3_PER_ACRE_FT } from '../erosion/units';

export type Figure = { main: string; alt: string };

export const lossFigure = (tPerHaYr: number, units: Units): Figure => {
  const si = `${formatFigure(tPerHaYr)} t/ha/yr`;
  const us = `${formatFigure(tPerHaToTonPerAc(tPerHaYr))} US t/ac/yr`;
  return units === 'ac' ? { main: us, alt: si } : { main: si, alt: us };
};

export const tonnesFigure = (tonnesPerYr: number, units: Units): Figure => {
  const si = `${formatFigure(tonnesPerYr)} t/yr`;
  const us = `${formatFigure(tToShortTon(tonnesPerYr))} US tons/yr`;
  return units === 'ac' ? { main: us, alt: si } : { main: si, alt: us };
};

export const runoffFigure = (runoffMm: number, units: Units): Figure => {
  const si = `${formatFigure(runoffMm)} mm`;
  const us = `${formatFigure(mmToIn(runoffMm))} in`;
  return units === 'ac' ? { main: us, alt: si } : { main: si, alt: us };
};

export const volumeFigure = (m3: number, units: Units): Figure => {
  const si = `${formatFigure(m3)} m³`;
  const us = `${formatFigure(m3 / M3_PER_ACRE_FT)} acre-ft`;
  return units === 'ac' ? { main: us, alt: si } : { main: si, alt: us };
};
