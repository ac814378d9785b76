/** A trip's own rules: defaults, the sky preset, the use-profile override merge, dates and list order. */
export * from './trip-defaults.js';
export * from './trip-sky.js';
export * from './use-profile-merge.js';
export * from './trip-calendar.js';
export * from './trip-solar-input.js';
export * from './engine-devices.js';
