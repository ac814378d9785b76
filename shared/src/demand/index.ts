export * from './device-demand.js';
