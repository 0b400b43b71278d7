export { LIVE_UPDATES, type LiveUpdates } from '../../core/events';
export { InProcessLiveUpdates } from './in-process.live-updates';
export { RedisLiveUpdates } from './redis.live-updates';
export { LiveUpdatesModule } from './live-updates.module';
