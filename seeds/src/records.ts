/**
 * The invented service records of the demo shops: owners, bikes and visits in
 * every status. All names, makers and models are made up; e-mails use `.test`.
 * Days are relative to the day the seed runs, so some promised dates are overdue.
 */
import type { ContactChannel, DecisionChannel } from '@benchproof/contracts';
import type {
  BrakeType,
  CableRouting,
  Condition,
  DropoutType,
  FrameMaterial,
  InspectionArea,
  JobStatus,
  MeasurementInput,
  Threadlocker,
  Urgency,
} from '@benchproof/domain';

export type DemoStatus = JobStatus;

export interface DemoOwner {
  key: string;
  name: string;
  email: string | null;
  phone: string | null;
  preferredChannel: ContactChannel;
}

export interface DemoBike {
  key: string;
  owner: string;
  maker: string;
  model: string;
  year: number | null;
  frameMaterial: FrameMaterial;
  size: string | null;
  colour: string | null;
  serialNumber: string | null;
  drivetrainSpeeds: number;
  brakeType: BrakeType;
  cableRouting: CableRouting;
  dropoutType: DropoutType;
  tyreSize: string | null;
}

export interface DemoFinding {
  area: InspectionArea;
  condition: Condition;
  description: string;
  recommendation?: {
    summary: string;
    /** CHECKS.md A.2 step 4: safety-critical, recommended soon, advisory. */
    urgency: Urgency;
    parts: { description: string; qty: number; unitPriceMinor: number }[];
    labourHundredths: number;
    decision?: { status: 'approved' | 'declined'; channel: Exclude<DecisionChannel, 'owner_link'>; decidedByName: string };
  };
}

export interface DemoTorque {
  fastener: string;
  spec: number;
  unit: 'nm';
  applied: number;
  specSource: string;
  tool: string;
  /** The wrench was last calibrated this many days before the work (the job's booking day). */
  toolCalibratedDaysBefore?: number;
  threadlocker?: Threadlocker;
  carbonPart: boolean;
}

export interface DemoJob {
  shop: 'lantern' | 'reed';
  bike: string;
  status: DemoStatus;
  /** Booked this many days before the seed runs. */
  daysAgo: number;
  /** Promised this many days after booking. */
  promisedAfterDays: number;
  mechanic: string | null;
  symptoms: string;
  conditions?: Record<string, Condition>;
  measurements?: { checkpoint: string; input: MeasurementInput }[];
  findings?: DemoFinding[];
  work?: { description: string; partsUsed: string; minutes: number }[];
  torque?: DemoTorque[];
  /** Who signs the final check (e-mail), for jobs at ready or beyond. */
  checker?: string;
}

export const DEMO_OWNERS: DemoOwner[] = [
  { key: 'ottilie', name: 'Ottilie Fernsby', email: 'ottilie.fernsby@example.test', phone: null, preferredChannel: 'email' },
  { key: 'caspian', name: 'Caspian Mordell', email: null, phone: '+44 1632 960 112', preferredChannel: 'phone' },
  { key: 'wilhelmina', name: 'Wilhelmina Tarrant', email: 'w.tarrant@example.test', phone: '+44 1632 960 245', preferredChannel: 'email' },
  { key: 'jory', name: 'Jory Pellham', email: 'jory.pellham@example.test', phone: null, preferredChannel: 'email' },
  { key: 'anouk', name: 'Anouk Selberg', email: null, phone: '+44 1632 960 377', preferredChannel: 'sms' },
  { key: 'fenwick', name: 'Fenwick Aldous', email: 'fenwick@example.test', phone: null, preferredChannel: 'email' },
  { key: 'reed-owner', name: 'Marisol Quent', email: 'marisol.quent@example.test', phone: null, preferredChannel: 'email' },
];

const bike = (b: DemoBike): DemoBike => b;
export const DEMO_BIKES: DemoBike[] = [
  bike({
    key: 'stratus',
    owner: 'ottilie',
    maker: 'Quillon Works',
    model: 'Stratus 11',
    year: 2021,
    frameMaterial: 'aluminium',
    size: 'M',
    colour: 'Slate blue',
    serialNumber: 'QW21-0457-S',
    drivetrainSpeeds: 11,
    brakeType: 'hydraulic_disc',
    cableRouting: 'internal',
    dropoutType: 'vertical',
    tyreSize: '28-622',
  }),
  bike({
    key: 'filbert',
    owner: 'caspian',
    maker: 'Marrowgate',
    model: 'Filbert 3',
    year: 1998,
    frameMaterial: 'steel',
    size: '56',
    colour: 'Racing green',
    serialNumber: 'MG-88213',
    drivetrainSpeeds: 8,
    brakeType: 'rim',
    cableRouting: 'external',
    dropoutType: 'horizontal',
    tyreSize: '32-622',
  }),
  bike({
    key: 'harrier',
    owner: 'wilhelmina',
    maker: 'Brackenfold',
    model: 'Harrier Loop',
    year: 2023,
    frameMaterial: 'carbon',
    size: 'S',
    colour: 'Matte sand',
    serialNumber: 'BF23-HL-0091',
    drivetrainSpeeds: 12,
    brakeType: 'hydraulic_disc',
    cableRouting: 'internal',
    dropoutType: 'vertical',
    tyreSize: '40-622',
  }),
  bike({
    key: 'tern',
    owner: 'jory',
    maker: 'Quillon Works',
    model: 'Tern Mill 10',
    year: 2017,
    frameMaterial: 'aluminium',
    size: 'L',
    colour: 'Silver',
    serialNumber: 'QW17-1180-T',
    drivetrainSpeeds: 10,
    brakeType: 'mechanical_disc',
    cableRouting: 'external',
    dropoutType: 'vertical',
    tyreSize: '35-622',
  }),
  bike({
    key: 'dray',
    owner: 'anouk',
    maker: 'Marrowgate',
    model: 'Cobble Dray 9',
    year: 2015,
    frameMaterial: 'steel',
    size: '54',
    colour: 'Oxblood',
    serialNumber: null,
    drivetrainSpeeds: 9,
    brakeType: 'rim',
    cableRouting: 'external',
    dropoutType: 'vertical',
    tyreSize: '28-622',
  }),
  bike({
    key: 'lumen',
    owner: 'fenwick',
    maker: 'Brackenfold',
    model: 'Lumen Step 7',
    year: 2020,
    frameMaterial: 'aluminium',
    size: 'One size',
    colour: 'Mint',
    serialNumber: 'BF20-LS-3321',
    drivetrainSpeeds: 7,
    brakeType: 'mechanical_disc',
    cableRouting: 'external',
    dropoutType: 'vertical',
    tyreSize: '47-584',
  }),
  bike({
    key: 'reed-bike',
    owner: 'reed-owner',
    maker: 'Quillon Works',
    model: 'Heron Gravel 11',
    year: 2022,
    frameMaterial: 'titanium',
    size: 'M',
    colour: 'Brushed',
    serialNumber: 'QW22-HG-7710',
    drivetrainSpeeds: 11,
    brakeType: 'hydraulic_disc',
    cableRouting: 'internal',
    dropoutType: 'vertical',
    tyreSize: '40-622',
  }),
];

const TOBIN = 'tobin@lantern-spoke.test';
const INES = 'ines@lantern-spoke.test';
const gauge = (gaugePct: number): MeasurementInput => ({ kind: 'chain_elongation', method: 'gauge', gaugePct });
const pad = (position: 'front' | 'rear', mm: number): MeasurementInput => ({ kind: 'pad_thickness', mm, minimumMm: 0.5, position });
const SHOP_MANUAL = "Component maker's printed value";

export const DEMO_JOBS: DemoJob[] = [
  // Three visits of the same 11-speed bike: the wear trend has three chain points.
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
  {
    shop: 'lantern',
    bike: 'filbert',
    status: 'booked_in',
    daysAgo: 3,
    promisedAfterDays: 2,
    mechanic: null,
    symptoms: 'Brakes feel weak and the gears grind. It has been in a shed for two winters.',
  },
  {
    shop: 'lantern',
    bike: 'lumen',
    status: 'on_stand',
    daysAgo: 0,
    promisedAfterDays: 2,
    mechanic: INES,
    symptoms: 'Clicking from the pedals on every turn.',
    conditions: { frame_damage: 'sound', fork_damage: 'sound', crank_fixing: 'wearing' },
    measurements: [{ checkpoint: 'chain_wear', input: gauge(0.5) }],
  },
  {
    shop: 'lantern',
    bike: 'harrier',
    status: 'in_work',
    daysAgo: 2,
    promisedAfterDays: 4,
    mechanic: INES,
    symptoms: 'Knock from the front when braking hard.',
    conditions: { steering_free: 'worn', headset_play: 'worn' },
    measurements: [
      { checkpoint: 'chain_wear', input: gauge(0.3) },
      { checkpoint: 'headset_play', input: { kind: 'bearing_play', grade: 'marked', bearing: 'headset' } },
    ],
    findings: [
      {
        area: 'steering_headset',
        condition: 'unsafe',
        description: 'Headset loose: play felt with the front brake on.',
        recommendation: {
          summary: 'Service and adjust headset',
          urgency: 'safety',
          parts: [{ description: 'Headset bearing set', qty: 1, unitPriceMinor: 2800 }],
          labourHundredths: 75,
          decision: { status: 'approved', channel: 'in_person', decidedByName: 'Wilhelmina Tarrant' },
        },
      },
    ],
    work: [{ description: 'Replaced headset bearings, adjusted preload', partsUsed: 'Headset bearing set', minutes: 45 }],
    torque: [
      {
        fastener: 'Stem steerer clamp bolts (carbon steerer)',
        spec: 5,
        unit: 'nm',
        applied: 5.1,
        specSource: SHOP_MANUAL,
        tool: 'Click wrench 2–24 N·m',
        toolCalibratedDaysBefore: 95,
        threadlocker: 'none',
        carbonPart: true,
      },
      {
        fastener: 'Top cap preload',
        spec: 2,
        unit: 'nm',
        applied: 2,
        specSource: SHOP_MANUAL,
        tool: 'Beam wrench 0–10 N·m',
        toolCalibratedDaysBefore: 420,
        threadlocker: 'none',
        carbonPart: true,
      },
    ],
  },
  {
    shop: 'lantern',
    bike: 'tern',
    status: 'final_check',
    daysAgo: 4,
    promisedAfterDays: 3,
    mechanic: TOBIN,
    symptoms: 'Gears slip in the middle of the cassette.',
    measurements: [{ checkpoint: 'chain_wear', input: gauge(0.8) }],
    findings: [
      {
        area: 'drivetrain',
        condition: 'worn',
        description: 'Chain past the 0.75 % limit for 10-speed.',
        recommendation: {
          summary: 'Replace chain',
          urgency: 'soon',
          parts: [{ description: 'Chain, 10-speed', qty: 1, unitPriceMinor: 2499 }],
          labourHundredths: 25,
          decision: { status: 'approved', channel: 'email', decidedByName: 'Jory Pellham' },
        },
      },
    ],
    work: [{ description: 'Fitted new chain, indexed rear derailleur', partsUsed: 'Chain, 10-speed', minutes: 25 }],
  },
  {
    shop: 'lantern',
    bike: 'dray',
    status: 'ready',
    daysAgo: 6,
    promisedAfterDays: 5,
    mechanic: TOBIN,
    checker: INES,
    symptoms: 'Puncture repair and a check-over.',
    measurements: [
      { checkpoint: 'chain_wear', input: gauge(0.5) },
      { checkpoint: 'tyre_clearance', input: { kind: 'tyre_clearance', mm: 4 } },
    ],
    findings: [
      {
        area: 'wheels_tyres',
        condition: 'wearing',
        description: 'Rear tyre tread worn flat in the centre.',
        recommendation: {
          summary: 'Replace rear tyre',
          urgency: 'advisory',
          parts: [{ description: 'Tyre 28-622', qty: 1, unitPriceMinor: 3200 }],
          labourHundredths: 20,
          decision: { status: 'declined', channel: 'phone', decidedByName: 'Anouk Selberg' },
        },
      },
    ],
    work: [{ description: 'Replaced rear inner tube', partsUsed: 'Inner tube 700×25–32', minutes: 15 }],
  },
  {
    shop: 'lantern',
    bike: 'filbert',
    status: 'cancelled',
    daysAgo: 30,
    promisedAfterDays: 7,
    mechanic: null,
    symptoms: 'Wanted a quote for a full rebuild; decided to wait.',
  },
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
