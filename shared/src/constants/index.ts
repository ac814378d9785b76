/**
 * Every named constant of the engine, with its unit in the name and its source in the doc comment.
 * Split by concern so the sun/sky side and the electrical side can grow independently.
 */
export * from './solar.js';
export * from './electrical.js';
export * from './limits.js';
export * from './station.js';
