/** Three visits of the same 11-speed bike: the wear trend has three chain points. */
import { gauge, INES, pad, SHOP_MANUAL, TOBIN } from './bench-kit';
import type { DemoJob } from './types';

export const STRATUS_VISITS: DemoJob[] = [
  {
    shop: 'lantern',
    bike: 'stratus',
    status: 'collected',
    daysAgo: 400,
    promisedAfterDays: 3,
    mechanic: TOBIN,
    checker: INES,
    symptoms: 'Spring service, nothing wrong that I know of.',
    measurements: [
      { checkpoint: 'chain_wear', input: gauge(0.2) },
      { checkpoint: 'front_pad_thickness', input: pad('front', 3.1) },
      { checkpoint: 'rear_pad_thickness', input: pad('rear', 2.9) },
    ],
    work: [{ description: 'General service: cleaned and lubed drivetrain, indexed gears', partsUsed: '', minutes: 60 }],
    torque: [
      {
        fastener: 'Stem steerer clamp bolts',
        spec: 5,
        unit: 'nm',
        applied: 5,
        specSource: SHOP_MANUAL,
        tool: 'Click wrench 2–24 N·m',
        toolCalibratedDaysBefore: 95,
        threadlocker: 'none',
        carbonPart: false,
      },
    ],
  },
  {
    shop: 'lantern',
    bike: 'stratus',
    status: 'collected',
    daysAgo: 200,
    promisedAfterDays: 2,
    mechanic: INES,
    checker: TOBIN,
    symptoms: 'Rear brake squeals in the wet.',
    measurements: [
      { checkpoint: 'chain_wear', input: gauge(0.4) },
      { checkpoint: 'front_pad_thickness', input: pad('front', 2.3) },
      { checkpoint: 'rear_pad_thickness', input: pad('rear', 1.9) },
    ],
    findings: [
      {
        area: 'brakes',
        condition: 'wearing',
        description: 'Rear pads glazed; rotor cleaned.',
        recommendation: {
          summary: 'Clean rotor, bed in pads',
          urgency: 'advisory',
          parts: [],
          labourHundredths: 25,
          decision: { status: 'approved', channel: 'in_person', decidedByName: 'Ottilie Fernsby' },
        },
      },
    ],
    work: [{ description: 'Cleaned rear rotor, sanded and bedded in pads', partsUsed: 'Disc brake cleaner', minutes: 20 }],
  },
  {
    shop: 'lantern',
    bike: 'stratus',
    status: 'waiting_owner',
    daysAgo: 1,
    promisedAfterDays: 3,
    mechanic: TOBIN,
    symptoms: 'Chain jumps on the small cogs when I stand up on the pedals.',
    conditions: { frame_damage: 'sound', steering_free: 'sound', shifting: 'wearing' },
    measurements: [
      // 24 pitches over a ruler: 307.24 mm vs 304.8 mm nominal = 0.80 % on an 11-speed chain → replace.
      { checkpoint: 'chain_wear', input: { kind: 'chain_elongation', method: 'ruler', pitches: 24, lengthValue: 307.24, lengthUnit: 'mm' } },
      { checkpoint: 'front_pad_thickness', input: pad('front', 1.6) },
      { checkpoint: 'rear_pad_thickness', input: pad('rear', 0.9) },
    ],
    findings: [
      {
        area: 'drivetrain',
        condition: 'worn',
        description: 'Chain at 0.8 % elongation, past the 0.5 % limit for 11-speed.',
        recommendation: {
          summary: 'Replace chain',
          urgency: 'soon',
          parts: [{ description: 'Chain, 11-speed', qty: 1, unitPriceMinor: 3499 }],
          labourHundredths: 25,
        },
      },
      {
        area: 'brakes',
        condition: 'worn',
        description: 'Rear pads close to the wear line.',
        recommendation: {
          summary: 'Replace rear brake pads',
          urgency: 'soon',
          parts: [{ description: 'Disc pads, organic', qty: 1, unitPriceMinor: 1899 }],
          labourHundredths: 30,
          decision: { status: 'approved', channel: 'phone', decidedByName: 'Ottilie Fernsby' },
        },
      },
      {
        area: 'cables_housing',
        condition: 'wearing',
        description: 'Rear gear housing frayed at the end cap.',
        recommendation: {
          summary: 'Replace rear gear cable and housing',
          urgency: 'advisory',
          parts: [
            { description: 'Gear inner cable', qty: 1, unitPriceMinor: 450 },
            { description: 'Gear housing (m)', qty: 1.5, unitPriceMinor: 600 },
          ],
          labourHundredths: 50,
          decision: { status: 'declined', channel: 'phone', decidedByName: 'Ottilie Fernsby' },
        },
      },
    ],
  },
];
