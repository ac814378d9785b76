export * from './bank.js';
