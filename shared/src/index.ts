/**
 * @gramwatt/shared — Gramwatt's pure domain code. No I/O, no clock, no randomness unless passed in.
 * Each folder has one job; this barrel re-exports them so client, server and seed import one package.
 */
export * from './constants/index.js';
export * from './units/index.js';
export * from './sun/index.js';
export * from './sky/index.js';
export * from './temperature/index.js';
export * from './harvest/index.js';
export * from './storage/index.js';
export * from './demand/index.js';
export * from './simulation/index.js';
export * from './optimisation/index.js';
export * from './party/index.js';
export * from './cautions/index.js';
export * from './schemas/index.js';
export * from './trips/index.js';
export * from './locker-csv/index.js';
export * from './gpx/index.js';
export * from './planning/index.js';
export * from './station/index.js';
