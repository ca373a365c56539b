// The map picture: the fields coloured by risk class over the farm's shaded relief, with their
// names, a legend in words, a scale bar and north. Field outlines and the relief picture are
// both placed in Web Mercator (EPSG:3857), the frame the relief picture was drawn on, so they
// line up; a farm is small enough that the scale bar's one ground scale holds across it.
import { RISK_CLASSES } from '../../../../shared/erosion/risk-class';
import { FT_PER_MI, mToFt } from '../../../../shared/erosion/units';
import { formatFigure } from '../../../../shared/format/figure';
import type { Units } from '../../../../shared/schemas/auth';
import type { ReportField, ReliefPicture } from '../report-data';
import { INK } from './fonts';

type Box = { x: number; y: number; w: number; h: number };
type Xy = [number, number];

const R_EARTH_M = 6_378_137;
/** Spherical Web Mercator (EPSG:3857), metres. */
const mercator = ([lng, lat]: number[]): Xy => [(R_EARTH_M * lng * Math.PI) / 180, R_EARTH_M * Math.log(Math.tan(Math.PI / 4 + (lat * Math.PI) / 360))];

const NOT_ASSESSED = { label: 'Not assessed yet', colour: '#ffffff' };

function extent(fields: ReportField[]): { minX: number; minY: number; maxX: number; maxY: number } {
  const pts = fields.flatMap((f) => f.geometry.coordinates.flat(2).map(mercator));
  const xs = pts.map((p) => p[0]);
  const ys = pts.map((p) => p[1]);
  return { minX: Math.min(...xs), minY: Math.min(...ys), maxX: Math.max(...xs), maxY: Math.max(...ys) };
}

/** 1, 2 or 5 times a power of ten, the longest not over `max`. */
function niceLength(max: number): number {
  const p = 10 ** Math.floor(Math.log10(max));
  return [5, 2, 1].map((m) => m * p).find((v) => v <= max) ?? p;
}

/** Draws the map inside the box and its legend below it; returns the y under the legend. */
export function drawRiskMap(doc: PDFKit.PDFDocument, box: Box, fields: ReportField[], relief: ReliefPicture | null, units: Units): number {
  const e = extent(fields);
  const pad = 0.08 * Math.max(e.maxX - e.minX, e.maxY - e.minY) + 30;
  const [minX, minY, maxX, maxY] = [e.minX - pad, e.minY - pad, e.maxX + pad, e.maxY + pad];
  const scale = Math.min(box.w / (maxX - minX), box.h / (maxY - minY));
  const w = (maxX - minX) * scale;
  const h = (maxY - minY) * scale;
  const ox = box.x + (box.w - w) / 2;
  const oy = box.y;
  const toPage = ([x, y]: Xy): Xy => [ox + (x - minX) * scale, oy + (maxY - y) * scale];

  doc.save();
  doc.rect(ox, oy, w, h).fill(INK.paper);
  doc.rect(ox, oy, w, h).clip();
  if (relief) {
    const [x0, y0] = toPage(mercator([relief.bounds.west, relief.bounds.north]));
    const [x1, y1] = toPage(mercator([relief.bounds.east, relief.bounds.south]));
    doc.image(relief.png, x0, y0, { width: x1 - x0, height: y1 - y0 });
  }
  for (const f of fields) {
    const risk = f.assessment?.riskClass ?? null;
    for (const polygon of f.geometry.coordinates) {
      for (const ring of polygon) {
        ring.forEach((pt, i) => {
          const [x, y] = toPage(mercator(pt));
          if (i === 0) doc.moveTo(x, y);
          else doc.lineTo(x, y);
        });
        doc.closePath();
      }
    }
    doc.fillOpacity(0.78).lineWidth(1).lineJoin('round').fillAndStroke(risk?.colour ?? NOT_ASSESSED.colour, INK.text, 'even-odd');
    doc.fillOpacity(1);
  }
  for (const f of fields) {
    const [x, y] = toPage(mercator(f.labelAt));
    doc.font('semi').fontSize(8);
    const tw = doc.widthOfString(f.name);
    doc.save().roundedRect(x - tw / 2 - 3, y - 6, tw + 6, 12, 2).fillOpacity(0.85).fill('#ffffff').restore();
    doc.fillColor(INK.text).text(f.name, x - tw / 2, y - 4.5, { lineBreak: false });
  }
  doc.restore();
  doc.rect(ox, oy, w, h).lineWidth(0.75).strokeColor(INK.faint).stroke();

  // Scale bar: ground metres per Mercator metre is cos(latitude) at the map's middle.
  const midLat = (Math.atan(Math.sinh((minY + maxY) / 2 / R_EARTH_M)) * 180) / Math.PI;
  const metresPerPt = Math.cos((midLat * Math.PI) / 180) / scale;
  // Feet for readers who work in acres, metres for hectares.
  const perPt = units === 'ac' ? mToFt(metresPerPt) : metresPerPt;
  const bar = niceLength(perPt * w * 0.25);
  const barPt = bar / perPt;
  const barWords = units === 'ac' ? (bar >= FT_PER_MI ? `${formatFigure(bar / FT_PER_MI)} mi` : `${formatFigure(bar)} ft`) : bar >= 1000 ? `${bar / 1000} km` : `${bar} m`;
  const bx = ox + 10;
  const by = oy + h - 14;
  doc.save().rect(bx - 4, by - 12, barPt + 44, 20).fillOpacity(0.85).fill('#ffffff').restore();
  doc.rect(bx, by, barPt, 3).fill(INK.text);
  doc.font('body').fontSize(7).fillColor(INK.text).text(barWords, bx, by - 10, { lineBreak: false });
  // North is up in Web Mercator.
  const nx = ox + w - 18;
  const ny = oy + 10;
  doc.save().polygon([nx, ny], [nx - 5, ny + 14], [nx + 5, ny + 14]).fill(INK.text).restore();
  doc.font('semi').fontSize(8).fillColor(INK.text).text('N', nx - 3, ny + 16, { lineBreak: false });

  return drawLegend(doc, { x: box.x, y: oy + h + 8, w: box.w }, relief !== null, fields.some((f) => !f.assessment?.riskClass));
}

function drawLegend(doc: PDFKit.PDFDocument, at: { x: number; y: number; w: number }, withRelief: boolean, withUnassessed: boolean): number {
  const entries = [...RISK_CLASSES.map((c) => ({ label: c.label, colour: c.colour })), ...(withUnassessed ? [NOT_ASSESSED] : [])];
  doc.font('semi').fontSize(8).fillColor(INK.text).text('Risk class, from A/T (estimated loss ÷ the soil-loss tolerance T)', at.x, at.y, { width: at.w });
  let y = doc.y + 3;
  const colW = at.w / 3;
  entries.forEach((entry, i) => {
    const x = at.x + (i % 3) * colW;
    const rowY = y + Math.floor(i / 3) * 13;
    doc.rect(x, rowY, 14, 9).fillAndStroke(entry.colour, INK.faint);
    doc.font('body').fontSize(7.5).fillColor(INK.text).text(entry.label, x + 18, rowY + 1, { width: colW - 22, lineBreak: false });
  });
  y += Math.ceil(entries.length / 3) * 13 + 2;
  const relief = withRelief ? 'Background: shaded relief from the farm’s elevation model.' : 'No elevation model for this farm yet: outlines only, no relief.';
  doc.font('body').fontSize(7).fillColor(INK.soft).text(`${relief} Colour-blind-safe colours (ColorBrewer YlOrBr, 5 classes); each class is named in words.`, at.x, y, { width: at.w });
  return doc.y;
}
