/**
 * The invented service records of the demo shops: owners, bikes and visits in
 * every status. All names, makers and models are made up; e-mails use `.test`.
 * Days are relative to the day the seed runs, so some promised dates are overdue.
 */
import { LANTERN_VISITS } from './records/lantern-visits';
import { REED_VISITS } from './records/reed-visits';
import { STRATUS_VISITS } from './records/stratus-visits';
import type { DemoJob } from './records/types';

export type * from './records/types';
export { DEMO_BIKES, DEMO_OWNERS } from './records/owners-bikes';

/** In seeding order (job numbers follow it). */
export const DEMO_JOBS: DemoJob[] = [...STRATUS_VISITS, ...LANTERN_VISITS, ...REED_VISITS];
