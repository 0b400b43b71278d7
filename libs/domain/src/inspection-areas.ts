/** Areas of the bench inspection, in the order a mechanic walks the bike (DESIGN.md). */
export const INSPECTION_AREAS = [
  'frame_fork',
  'steering_headset',
  'drivetrain',
  'brakes',
  'wheels_tyres',
  'cables_housing',
  'bearings',
  'contact_points',
  'frame_interior',
] as const;
export type InspectionArea = (typeof INSPECTION_AREAS)[number];

export const INSPECTION_AREA_LABELS: Readonly<Record<InspectionArea, string>> = {
  frame_fork: 'Frame & fork',
  steering_headset: 'Steering & headset',
  drivetrain: 'Drivetrain',
  brakes: 'Brakes',
  wheels_tyres: 'Wheels & tyres',
  cables_housing: 'Cables & housing',
  bearings: 'Bearings',
  contact_points: 'Contact points',
  frame_interior: 'Frame interior (scope)',
};

/** Type guard for untrusted strings. */
export function isInspectionArea(value: unknown): value is InspectionArea {
  return typeof value === 'string' && (INSPECTION_AREAS as readonly string[]).includes(value);
}

/** Typed readings a checkpoint can carry; each has its own computation. */
export const MEASUREMENT_KINDS = [
  'chain_elongation',
  'wheel_centring',
  'tyre_clearance',
  'pad_thickness',
  'rotor_thickness',
  'cable_diameter',
  'bearing_play',
  'stem_gap',
] as const;
export type MeasurementKind = (typeof MEASUREMENT_KINDS)[number];

export const MEASUREMENT_KIND_LABELS: Readonly<Record<MeasurementKind, string>> = {
  chain_elongation: 'Chain elongation',
  wheel_centring: 'Wheel centring in the frame',
  tyre_clearance: 'Tyre clearance to frame/fork',
  pad_thickness: 'Brake pad thickness',
  rotor_thickness: 'Brake rotor thickness',
  cable_diameter: 'Inner cable diameter',
  bearing_play: 'Bearing play',
  stem_gap: 'Stem top to steerer top gap',
};

/** Front/rear position for pads, rotors and wheels. */
export const WHEEL_POSITIONS = ['front', 'rear'] as const;
export type WheelPosition = (typeof WHEEL_POSITIONS)[number];
