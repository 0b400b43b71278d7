export * from './domain-events';
