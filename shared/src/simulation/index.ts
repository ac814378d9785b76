export * from './connections.js';
export * from './types.js';
export * from './simulate-kit.js';
export { compileKit, type CompiledKit } from './compile-kit.js';
export { kitVerdict, keepsUpReferenceDay } from './verdict.js';
