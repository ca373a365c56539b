// The Fieldshed erosion and runoff engine: pure functions, SI units unless named otherwise.
// Entry points (DESIGN.md): classifyTexture, kFactorNomograph, rusleLS, rFromAnnualPrecipitation,
// soilLoss, curveNumberRunoff; estimate() runs a whole estimate.
export * from './assert';
export * from './units';
export * from './texture';
export * from './k-factor';
export * from './slope-length';
export * from './slope-class';
export * from './cover';
export * from './support-practice';
export * from './erosivity';
export * from './tolerance';
export * from './soil-loss';
export * from './runoff';
export * from './curve-number-cover';
export * from './soil-group';
export * from './drainage';
export * from './amendments';
export * from './estimate';
export * from './risk-class';
export * from './version';
export * from './lime';
export * from './gypsum';
export * from './organic-matter-k';
export * from './budget-plan';
export * from './treatments/types';
export * from './treatments/field-treatments';
export * from './treatments/example-prices';
export * from './treatments/support-practices';
export * from './treatments/water-paths';
