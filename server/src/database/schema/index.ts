export * from './accounts';
