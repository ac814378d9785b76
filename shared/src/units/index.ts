export * from './energy.js';
