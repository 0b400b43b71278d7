import type { InspectionArea, MeasurementKind } from './inspection-areas';
import type { BrakeType } from './bike';

/** One item of the default inspection checklist. */
export interface CheckpointTemplate {
  readonly key: string;
  readonly label: string;
  readonly area: InspectionArea;
  /** Readings expected at this checkpoint (may be empty: visual check). */
  readonly measurementKinds: readonly MeasurementKind[];
  /** Brakes, steering, clamps, wheel retention, structure: a fault here can hurt the rider. */
  readonly safetyCritical: boolean;
}

const cp = (
  area: InspectionArea,
  key: string,
  label: string,
  safetyCritical: boolean,
  measurementKinds: readonly MeasurementKind[] = [],
): CheckpointTemplate => ({ key, label, area, measurementKinds, safetyCritical });

/**
 * The checklist a new job starts with (common practice, no source: the areas
 * and checks of a standard workshop service, CHECKS.md A.2/A.5). Bearing play
 * is graded none/slight/marked: there is no numeric workshop standard
 * (ISO 4210-2 4.7.5 only asks for no tight spots, stiffness or slackness), so
 * no millimetre limits appear anywhere here.
 */
export const DEFAULT_CHECKPOINTS: readonly CheckpointTemplate[] = [
  cp('frame_fork', 'frame_damage', 'Frame: cracks, dents, corrosion', true),
  cp('frame_fork', 'fork_damage', 'Fork: cracks, bends, dropout damage', true),
  cp('frame_fork', 'finish_marks', 'Paint and finish: marks already present', false),

  cp('steering_headset', 'steering_free', 'Steering turns freely, no tight spots', true),
  cp('steering_headset', 'stem_steerer_clamp', 'Stem clamp on steerer and steerer gap', true, ['stem_gap']),
  cp('steering_headset', 'fork_steerer', 'Fork steerer: no cracks or clamp marks', true),

  cp('drivetrain', 'chain_wear', 'Chain wear', false, ['chain_elongation']),
  cp('drivetrain', 'cassette', 'Cassette / rear sprockets', false),
  cp('drivetrain', 'chainrings', 'Chainrings', false),
  cp('drivetrain', 'derailleur_hanger', 'Derailleur hanger alignment', false),
  cp('drivetrain', 'shifting', 'Shifting across the range', false),
  cp('drivetrain', 'crank_fixing', 'Crank arms and pedals secure', true),

  cp('brakes', 'front_brake_function', 'Front brake function', true),
  cp('brakes', 'rear_brake_function', 'Rear brake function', true),
  cp('brakes', 'front_pad_thickness', 'Front pad thickness', true, ['pad_thickness']),
  cp('brakes', 'rear_pad_thickness', 'Rear pad thickness', true, ['pad_thickness']),
  cp('brakes', 'front_rotor_thickness', 'Front rotor thickness', true, ['rotor_thickness']),
  cp('brakes', 'rear_rotor_thickness', 'Rear rotor thickness', true, ['rotor_thickness']),
  cp('brakes', 'hoses_fluid', 'Hoses, fittings and fluid (hydraulic)', true),

  cp('wheels_tyres', 'front_centring', 'Front wheel centring', false, ['wheel_centring']),
  cp('wheels_tyres', 'rear_centring', 'Rear wheel centring', false, ['wheel_centring']),
  cp('wheels_tyres', 'tyre_clearance', 'Tyre clearance to frame and fork', true, ['tyre_clearance']),
  cp('wheels_tyres', 'tyre_condition', 'Tyre tread, sidewalls and cuts', true),
  cp('wheels_tyres', 'wheel_true', 'Wheels true and round', false),
  cp('wheels_tyres', 'spoke_tension', 'Spokes: none loose or broken', false),
  cp('wheels_tyres', 'wheel_retention', 'Quick-releases / thru-axles closed', true),

  cp('cables_housing', 'brake_cable', 'Brake inner cables', true, ['cable_diameter']),
  cp('cables_housing', 'shift_cable', 'Shift inner cables', false, ['cable_diameter']),
  cp('cables_housing', 'brake_housing_type', 'Brake housing is brake-type (coil), not shift housing', true),
  cp('cables_housing', 'housing_condition', 'Housing: kinks, cracks, frayed ends', false),
  cp('cables_housing', 'end_caps', 'Cable end caps present, strands not cut at pinch bolts', true),

  cp('bearings', 'headset_play', 'Headset play', true, ['bearing_play']),
  cp('bearings', 'front_hub_play', 'Front hub play', false, ['bearing_play']),
  cp('bearings', 'rear_hub_play', 'Rear hub play', false, ['bearing_play']),
  cp('bearings', 'bb_play', 'Bottom bracket play', false, ['bearing_play']),

  cp('contact_points', 'bar_stem_clamp', 'Handlebar and stem clamp bolts', true),
  cp('contact_points', 'lever_clamps', 'Brake lever and shifter clamps', true),
  cp('contact_points', 'seatpost_insertion', 'Seat-post insertion (minimum mark hidden)', true),
  cp('contact_points', 'saddle_clamp', 'Saddle and seat clamps', true),
  cp('contact_points', 'grips_tape', 'Grips / bar tape and bar-end plugs', false),

  cp('frame_interior', 'scope_seat_tube', 'Seat tube inside: corrosion, water, debris', false),
  cp('frame_interior', 'scope_down_tube', 'Down tube inside: corrosion, water, debris', false),
  cp('frame_interior', 'scope_top_tube', 'Top tube inside: corrosion, water, debris', false),
  cp('frame_interior', 'scope_steerer', 'Fork steerer inside: corrosion, damage', true),
];

/** The default checkpoints of one area, in checklist order. */
export function checkpointsForArea(area: InspectionArea): CheckpointTemplate[] {
  return DEFAULT_CHECKPOINTS.filter((c) => c.area === area);
}

/** A default checkpoint by key, or undefined. */
export function findCheckpoint(key: string): CheckpointTemplate | undefined {
  return DEFAULT_CHECKPOINTS.find((c) => c.key === key);
}

/** Checkpoints that do not exist on a given brake type. */
const NOT_FOR_BRAKE: Readonly<Record<BrakeType, readonly string[]>> = {
  rim: ['front_rotor_thickness', 'rear_rotor_thickness', 'hoses_fluid'],
  mechanical_disc: ['hoses_fluid'],
  hydraulic_disc: ['brake_cable', 'brake_housing_type'],
};

/**
 * The default checklist for one bike: rotor and hose checks only on disc or
 * hydraulic brakes, brake-cable checks only where brakes are cable-operated,
 * shift-cable checks dropped on a single-speed.
 */
export function checkpointsForBike(bike: { brakeType: BrakeType; drivetrainSpeeds: number }): CheckpointTemplate[] {
  const skip = new Set(NOT_FOR_BRAKE[bike.brakeType]);
  if (bike.drivetrainSpeeds === 1) ['shift_cable', 'shifting', 'derailleur_hanger'].forEach((k) => skip.add(k));
  return DEFAULT_CHECKPOINTS.filter((c) => !skip.has(c.key));
}
