import type { InspectionArea } from './inspection-areas';
import type { MeasurementInput } from './measurement';
import { BRAKE_CAUTION, CARBON_CAUTION, SCOPE_CAUTION, STEERING_CAUTION, TORQUE_CAUTION, WHEEL_CAUTION } from './safety';

/**
 * The safety texts (safety.ts, CHECKS.md D) that go with an inspection area:
 * brakes, steering, wheels, clamps and the scope's limits; carbon when the
 * frame is carbon and the area is structural or a clamp. Empty when none applies.
 */
export function areaCautions(area: InspectionArea, opts: { carbonFrame?: boolean } = {}): string[] {
  const carbon = opts.carbonFrame ? [CARBON_CAUTION] : [];
  switch (area) {
    case 'brakes':
      return [BRAKE_CAUTION];
    case 'steering_headset':
      return [STEERING_CAUTION, ...carbon];
    case 'wheels_tyres':
      return [WHEEL_CAUTION];
    case 'contact_points':
      return [TORQUE_CAUTION, ...carbon];
    case 'frame_fork':
      return carbon;
    case 'frame_interior':
      return [SCOPE_CAUTION];
    case 'drivetrain':
    case 'cables_housing':
    case 'bearings':
      return [];
  }
}

/** The safety texts shown beside one measurement's verdict (brakes, steering, wheels). */
export function measurementCautions(input: MeasurementInput): string[] {
  switch (input.kind) {
    case 'pad_thickness':
    case 'rotor_thickness':
      return [BRAKE_CAUTION];
    case 'cable_diameter':
      return input.cable === 'brake' ? [BRAKE_CAUTION] : [];
    case 'stem_gap':
      return [STEERING_CAUTION];
    case 'bearing_play':
      return input.bearing === 'headset' ? [STEERING_CAUTION] : [];
    case 'wheel_centring':
    case 'tyre_clearance':
      return [WHEEL_CAUTION];
    case 'chain_elongation':
      return [];
  }
}
