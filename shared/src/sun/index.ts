export * from './trip-solar-types.js';
