export * from './auth.js';
export * from './api-error.js';
