import type { MeasurementKind } from './inspection-areas';

/**
 * One line per measurement kind, for a bike owner who is not a mechanic: what
 * the reading says about their bike and why it matters. Trade explanations in
 * our own words (common practice, no source); the verdict itself comes from
 * the measurement's computation, not from this text.
 */
export const MEASUREMENT_PLAIN_WORDS: Readonly<Record<MeasurementKind, string>> = {
  chain_elongation:
    'Chains stretch as their pins wear. A stretched chain wears the cassette and chainrings fast, so changing the chain in time saves the more expensive parts.',
  wheel_centring: 'How centred the wheel sits in the frame. An off-centre wheel can rub, steer oddly or point to a loose axle.',
  tyre_clearance: 'The gap between tyre and frame. Too little gap lets mud or a bulging tyre rub through the frame.',
  pad_thickness: 'How much brake pad is left. Worn-out pads stop poorly and can score the rotor or rim.',
  rotor_thickness: 'How thick the brake disc still is. A disc worn thin heats up, stops worse and can crack.',
  cable_diameter: 'Whether the inner cable is the right size and intact. A frayed or wrong cable can snap or shift badly.',
  bearing_play: 'Whether a bearing has knock or roughness. Loose bearings wear quickly; in the headset they affect steering.',
  stem_gap: 'The gap under the stem cap that lets the headset be set up. Without it the steering cannot be held firmly.',
};
