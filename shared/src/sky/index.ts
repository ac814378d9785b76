export * from './cloud-chain.js';
export * from './design-skies.js';
export * from './sky-presets.js';
