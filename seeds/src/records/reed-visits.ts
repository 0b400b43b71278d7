/** The second shop's one visit, so that shop isolation has something to hide. */
import { gauge } from './bench-kit';
import type { DemoJob } from './types';

export const REED_VISITS: DemoJob[] = [
  {
    shop: 'reed',
    bike: 'reed-bike',
    status: 'on_stand',
    daysAgo: 1,
    promisedAfterDays: 2,
    mechanic: 'oskar@hollow-reed.test',
    symptoms: 'Rear brake lever pulls to the bar.',
    measurements: [{ checkpoint: 'chain_wear', input: gauge(0.2) }],
  },
];
