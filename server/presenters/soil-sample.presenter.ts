// A stored soil sample as the API's SoilSample: feel-test answers grouped, dates as ISO strings.
import type { SoilSample as SoilSampleBody } from '../../shared/schemas/soils';
import type { SoilSample } from '../models';
import { lastChangeOf } from './last-change.presenter';

export function presentSample(s: SoilSample): SoilSampleBody {
  return {
    id: s.id,
    fieldId: s.fieldId,
    kind: s.kind,
    label: s.label,
    sampledOn: s.sampledOn,
    depthTopCm: s.depthTopCm,
    depthBottomCm: s.depthBottomCm,
    sandPct: s.sandPct,
    siltPct: s.siltPct,
    clayPct: s.clayPct,
    separatesSumPct: s.separatesSumPct,
    organicMatterPct: s.organicMatterPct,
    ph: s.ph,
    bufferPh: s.bufferPh,
    bufferMethod: s.bufferMethod,
    depthToGrayCm: s.depthToGrayCm,
    describedToCm: s.describedToCm,
    bulkDensity: s.bulkDensityMgM3,
    cecCmolPerKg: s.cecCmolKg,
    espPct: s.espPct,
    position: s.position ? { lng: s.position.coordinates[0], lat: s.position.coordinates[1], accuracyM: s.positionAccuracyM ?? 0 } : null,
    feelTest: s.kind === 'feel' ? { balls: s.feelBalls ?? false, ribbonCm: s.feelRibbonCm, feel: s.feelGrit, ribbonClass: s.ribbonClass } : null,
    textureClass: s.textureClass,
    textureSource: s.textureSource,
    drainageClass: s.drainageClass,
    notWorthAmending: s.notWorthAmending,
    drainageSource: s.drainageSource,
    version: s.version,
    createdAt: s.createdAt.toISOString(),
    updatedAt: s.updatedAt.toISOString(),
    lastChange: lastChangeOf(s),
  };
}

export const presentSamples = (samples: SoilSample[]): SoilSampleBody[] => samples.map(presentSample);
