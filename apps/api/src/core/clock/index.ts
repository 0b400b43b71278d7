export { CLOCK, systemClock, type Clock } from './clock';
export { ClockModule } from './clock.module';
