export { claimMs, everyTick, TICK_GATE, type TickGate } from './tick-gate.port';
