import {
  BEARINGS,
  BEARING_PLAY_GRADES,
  CONDITIONS,
  INSPECTION_AREAS,
  LENGTH_UNITS,
  MEASUREMENT_KINDS,
  WHEEL_POSITIONS,
  type MeasurementInput,
} from '@benchproof/domain';
import { z } from 'zod';
import { IsoDateTimeSchema } from './common';

export const ConditionSchema = z.enum(CONDITIONS);
export const InspectionAreaSchema = z.enum(INSPECTION_AREAS);

const mm = z.number().finite();
const position = z.enum(WHEEL_POSITIONS);
const kind = <K extends string>(k: K) => z.literal(k);

const chain = z.discriminatedUnion('method', [
  z.object({ kind: kind('chain_elongation'), method: z.literal('ruler'), pitches: z.number().int(), lengthValue: mm, lengthUnit: z.enum(LENGTH_UNITS) }),
  z.object({
    kind: kind('chain_elongation'),
    method: z.literal('caliper'),
    pitches: z.number().int(),
    insideValue: mm,
    outsideValue: mm,
    lengthUnit: z.enum(LENGTH_UNITS),
  }),
  z.object({ kind: kind('chain_elongation'), method: z.literal('gauge'), gaugePct: z.number().finite() }),
]);

/** A typed reading, one shape per kind; the same shapes libs/domain assessMeasurement takes. */
export const MeasurementInputSchema = z.discriminatedUnion('kind', [
  chain,
  z.object({ kind: kind('wheel_centring'), leftMm: mm, rightMm: mm, position: position.optional() }),
  z.object({ kind: kind('tyre_clearance'), mm, position: position.optional() }),
  z.object({ kind: kind('pad_thickness'), mm, minimumMm: mm, position }),
  z.object({ kind: kind('rotor_thickness'), mm, minimumMm: mm, position }),
  z.object({ kind: kind('cable_diameter'), cable: z.enum(['brake', 'shift']), mm }),
  z.object({ kind: kind('bearing_play'), grade: z.enum(BEARING_PLAY_GRADES), bearing: z.enum(BEARINGS), dialGaugeMm: mm.nullable().optional() }),
  z.object({ kind: kind('stem_gap'), mm }),
]);
export type MeasurementInputDto = z.infer<typeof MeasurementInputSchema>;
// Compile-time proof that the contract and the domain agree on every shape.
const _sameShape = (m: MeasurementInputDto): MeasurementInput => m;
void _sameShape;

export const MeasurementResultSchema = z.object({
  condition: ConditionSchema,
  verdict: z.string(),
  message: z.string(),
  /** Safety text that applies (maker's instructions govern, qualified mechanic). */
  cautions: z.array(z.string()),
});
export type MeasurementResultDto = z.infer<typeof MeasurementResultSchema>;

export const MeasurementDtoSchema = z.object({
  id: z.number().int(),
  checkpointId: z.number().int().nullable(),
  kind: z.enum(MEASUREMENT_KINDS),
  input: MeasurementInputSchema,
  result: MeasurementResultSchema,
  unit: z.string(),
  userId: z.number().int().nullable(),
  at: IsoDateTimeSchema,
});
export type MeasurementDto = z.infer<typeof MeasurementDtoSchema>;

export const CheckpointDtoSchema = z.object({
  id: z.number().int(),
  area: InspectionAreaSchema,
  key: z.string(),
  label: z.string(),
  safetyCritical: z.boolean(),
  condition: ConditionSchema.nullable(),
  notes: z.string(),
  measurementKinds: z.array(z.enum(MEASUREMENT_KINDS)),
  measurements: z.array(MeasurementDtoSchema),
  inspectedBy: z.number().int().nullable(),
  inspectedAt: IsoDateTimeSchema.nullable(),
});
export type CheckpointDto = z.infer<typeof CheckpointDtoSchema>;

export const InspectionAreaDtoSchema = z.object({
  area: InspectionAreaSchema,
  label: z.string(),
  worstCondition: ConditionSchema.nullable(),
  /** Safety text for the area (brakes, steering, wheels, frame interior); empty when none applies. */
  cautions: z.array(z.string()),
  checkpoints: z.array(CheckpointDtoSchema),
});

export const InspectionDtoSchema = z.object({
  jobId: z.number().int(),
  drivetrainSpeeds: z.number().int(),
  inspected: z.number().int(),
  total: z.number().int(),
  areas: z.array(InspectionAreaDtoSchema),
});
export type InspectionDto = z.infer<typeof InspectionDtoSchema>;

export const UpdateCheckpointRequestSchema = z.object({
  condition: ConditionSchema.nullable().optional(),
  notes: z.string().max(2000).optional(),
});
export type UpdateCheckpointRequest = z.infer<typeof UpdateCheckpointRequestSchema>;
