export * from './auth.js';
export * from './api-error.js';
export * from './ports.js';
export * from './items.js';
export * from './devices.js';
export * from './kit.js';
export * from './trip-solar.js';
export * from './locker.js';
