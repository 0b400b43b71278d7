/**
 * Periodic work (`@nestjs/schedule` intervals) runs once across API processes: each process ticks on
 * its own timer and asks the gate first; only the process that wins the tick does the work. With one
 * process (no REDIS_URL) every tick is this process's; with Redis the first tick of any process claims
 * the work for 90 % of the period (SET NX PX), so the work runs about once a period whoever ticks.
 */
export interface TickGate {
  claim(name: string, periodMs: number): Promise<boolean>;
}

export const TICK_GATE = Symbol('TICK_GATE');

/** One process: every tick is ours. */
export const everyTick: TickGate = { claim: () => Promise.resolve(true) };

/** How long a claimed tick keeps the others out: a little under one period, so the next tick of anyone runs. */
export const claimMs = (periodMs: number): number => Math.max(1, Math.floor(periodMs * 0.9));
