/** The locker's CSV format: its columns, reading an upload into checked items, writing a locker out. */
export * from './columns.js';
export * from './cells.js';
export * from './read-locker-csv.js';
export * from './write-locker-csv.js';
