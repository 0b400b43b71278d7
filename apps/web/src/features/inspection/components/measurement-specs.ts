import {
  BEARING_PLAY_GRADES,
  BEARING_PLAY_GRADE_LABELS,
  type Bearing,
  type LengthUnit,
  type MeasurementInput,
  type MeasurementKind,
  type WheelPosition,
} from '@benchproof/domain';

export type Values = Record<string, string>;
export interface NumberField {
  type: 'number';
  key: string;
  label: string;
  suffix?: string;
  step: number;
  description?: string;
  optional?: boolean;
}
export interface ChoiceField {
  type: 'choice';
  key: string;
  label: string;
  options: { value: string; label: string }[];
}
export type FieldSpec = NumberField | ChoiceField;

/** What the checkpoint tells a form: which wheel, which cable, which bearing, which unit. */
export interface SpecContext {
  checkpointKey: string;
  lengthUnit: LengthUnit;
}

export interface KindSpec {
  fields: (v: Values) => FieldSpec[];
  initial: (ctx: SpecContext) => Values;
  /** null while a required field is still empty. */
  build: (v: Values, ctx: SpecContext) => MeasurementInput | null;
}

/** "0,5" and "0.5" both read as one half; empty is null. */
export function readNumber(text: string | undefined): number | null {
  if (text === undefined || text.trim() === '') return null;
  const n = Number(text.replace(',', '.'));
  return Number.isFinite(n) ? n : Number.NaN;
}

const positionOf = (key: string): WheelPosition => (key.startsWith('rear') ? 'rear' : 'front');
const BEARING_BY_KEY: Record<string, Bearing> = { headset_play: 'headset', front_hub_play: 'front_hub', rear_hub_play: 'rear_hub', bb_play: 'bottom_bracket' };
const mmField = (key: string, label: string, description?: string): NumberField => ({ type: 'number', key, label, suffix: 'mm', step: 0.1, description });
const unitField: ChoiceField = {
  type: 'choice',
  key: 'lengthUnit',
  label: 'Unit',
  options: [
    { value: 'mm', label: 'mm' },
    { value: 'in', label: 'in' },
  ],
};

function needAll(v: Values, keys: string[]): number[] | null {
  const nums = keys.map((k) => readNumber(v[k]));
  return nums.some((n) => n === null) ? null : (nums as number[]);
}

const chain: KindSpec = {
  fields: (v) => {
    const method: ChoiceField = {
      type: 'choice',
      key: 'method',
      label: 'Method',
      options: [
        { value: 'ruler', label: 'Ruler' },
        { value: 'caliper', label: 'Caliper' },
        { value: 'gauge', label: 'Gauge' },
      ],
    };
    const suffix = v.lengthUnit;
    const pitches: NumberField = { type: 'number', key: 'pitches', label: 'Pitches measured', step: 2, description: 'Pin to pin; a full link is 2 pitches' };
    if (v.method === 'gauge')
      return [
        method,
        {
          type: 'number',
          key: 'gaugePct',
          label: 'Gauge reading',
          suffix: '%',
          step: 0.25,
          description: 'The mark that dropped in (0 if none), or a dial reading',
        },
      ];
    if (v.method === 'caliper') {
      return [
        method,
        unitField,
        pitches,
        { type: 'number', key: 'insideValue', label: 'Inside reading', suffix, step: 0.01 },
        { type: 'number', key: 'outsideValue', label: 'Outside reading', suffix, step: 0.01 },
      ];
    }
    return [
      method,
      unitField,
      pitches,
      { type: 'number', key: 'lengthValue', label: 'Length over those pitches', suffix, step: 0.01, description: 'Pin centre to pin centre' },
    ];
  },
  initial: (ctx) => ({ method: 'ruler', lengthUnit: ctx.lengthUnit, pitches: '24', lengthValue: '', insideValue: '', outsideValue: '', gaugePct: '' }),
  build: (v) => {
    const unit = v.lengthUnit as LengthUnit;
    if (v.method === 'gauge') {
      const g = needAll(v, ['gaugePct']);
      return g && { kind: 'chain_elongation', method: 'gauge', gaugePct: g[0] };
    }
    if (v.method === 'caliper') {
      const n = needAll(v, ['pitches', 'insideValue', 'outsideValue']);
      return n && { kind: 'chain_elongation', method: 'caliper', pitches: n[0], insideValue: n[1], outsideValue: n[2], lengthUnit: unit };
    }
    const n = needAll(v, ['pitches', 'lengthValue']);
    return n && { kind: 'chain_elongation', method: 'ruler', pitches: n[0], lengthValue: n[1], lengthUnit: unit };
  },
};

const single = (kind: 'tyre_clearance' | 'stem_gap', label: string, description?: string): KindSpec => ({
  fields: () => [mmField('mm', label, description)],
  initial: () => ({ mm: '' }),
  build: (v, ctx) => {
    const n = needAll(v, ['mm']);
    if (!n) return null;
    return kind === 'tyre_clearance' ? { kind, mm: n[0], position: positionOf(ctx.checkpointKey) } : { kind, mm: n[0] };
  },
});

const thickness = (kind: 'pad_thickness' | 'rotor_thickness', what: string, minHint: string): KindSpec => ({
  fields: () => [mmField('mm', `${what} thickness`), mmField('minimumMm', 'Minimum', minHint)],
  initial: () => ({ mm: '', minimumMm: '' }),
  build: (v, ctx) => {
    const n = needAll(v, ['mm', 'minimumMm']);
    return n && { kind, mm: n[0], minimumMm: n[1], position: positionOf(ctx.checkpointKey) };
  },
});

export const KIND_SPECS: Readonly<Record<MeasurementKind, KindSpec>> = {
  chain_elongation: chain,
  wheel_centring: {
    fields: () => [mmField('leftMm', 'Gap on the left'), mmField('rightMm', 'Gap on the right')],
    initial: () => ({ leftMm: '', rightMm: '' }),
    build: (v, ctx) => {
      const n = needAll(v, ['leftMm', 'rightMm']);
      return n && { kind: 'wheel_centring', leftMm: n[0], rightMm: n[1], position: positionOf(ctx.checkpointKey) };
    },
  },
  tyre_clearance: single('tyre_clearance', 'Smallest gap tyre to frame/fork'),
  pad_thickness: thickness('pad_thickness', 'Pad', "The pad maker's minimum"),
  rotor_thickness: thickness('rotor_thickness', 'Rotor', 'The minimum printed on the rotor'),
  cable_diameter: {
    fields: () => [mmField('mm', 'Inner cable diameter')],
    initial: () => ({ mm: '' }),
    build: (v, ctx) => {
      const n = needAll(v, ['mm']);
      return n && { kind: 'cable_diameter', cable: ctx.checkpointKey.startsWith('brake') ? 'brake' : 'shift', mm: n[0] };
    },
  },
  bearing_play: {
    fields: () => [
      { type: 'choice', key: 'grade', label: 'Play felt', options: BEARING_PLAY_GRADES.map((g) => ({ value: g, label: BEARING_PLAY_GRADE_LABELS[g] })) },
      { type: 'number', key: 'dialGaugeMm', label: 'Dial gauge (optional)', suffix: 'mm', step: 0.01, optional: true, description: 'Kept for comparison only' },
    ],
    initial: () => ({ grade: 'none', dialGaugeMm: '' }),
    build: (v, ctx) => ({
      kind: 'bearing_play',
      grade: v.grade as (typeof BEARING_PLAY_GRADES)[number],
      bearing: BEARING_BY_KEY[ctx.checkpointKey] ?? 'headset',
      dialGaugeMm: readNumber(v.dialGaugeMm),
    }),
  },
  stem_gap: single('stem_gap', 'Steerer top below stem top', '0 = flush'),
};
