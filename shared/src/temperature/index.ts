export * from './daily-air-temperature.js';
export * from './cell-temperature.js';
