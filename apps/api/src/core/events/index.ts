export * from './domain-events';
export { LIVE_UPDATES, type LiveUpdates } from './live-updates.port';
