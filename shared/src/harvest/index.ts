export * from './system-factor.js';
export * from './panel-power.js';
export * from './panel-series.js';
