export * from './accounts';
export * from './locker-items';
export * from './locker-item-files';
export * from './catalogue-entries';
export * from './trips';
export * from './trip-members';
export * from './trip-devices';
