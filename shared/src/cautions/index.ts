export * from './kit-cautions.js';
