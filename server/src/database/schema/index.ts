export * from './accounts';
export * from './locker-items';
