/*
 * Safety wording in the shop's voice (CHECKS.md section D: principle of
 * deferring to the maker's instructions, local law and a qualified mechanic).
 * Sketches for the shop or its adviser to review; never a claim of
 * certification or of compliance with any standard.
 */

/** Footer of every report and owner page. */
export const GENERAL_SAFETY =
  'This report describes the condition we found and the work we did on the date shown. ' +
  'It is not a guarantee of future condition. Where it differs from the bicycle or component ' +
  "maker's instructions, the maker's instructions and your local regulations govern. " +
  'If anything feels wrong, stop riding and have the bike checked by a qualified mechanic.';

/** Shown wherever a torque value, a torque verdict or a converted torque appears. */
export const TORQUE_CAUTION =
  "The component maker's printed torque value governs. We set torques with a calibrated torque " +
  'wrench to that value; do not exceed it, especially on carbon parts. A value shown in another ' +
  'unit is a conversion for reference only. Tightening brake, steering and clamp bolts is work ' +
  'for a qualified mechanic.';

/** Shown with any carbon frame, fork, bar, stem, post or wheel. */
export const CARBON_CAUTION =
  'Carbon parts can be damaged inside without any visible sign. After a crash or a heavy knock, ' +
  "have carbon frames, forks, bars, posts and wheels inspected, and replace them if the maker's " +
  "advice says so. Use assembly (friction) paste only where the maker says to, and never exceed the maker's torque.";

/** Shown with brake findings and brake work. */
export const BRAKE_CAUTION =
  'Do not ride if a brake lever reaches the handlebar or feels spongy, or if a brake grinds. ' +
  "Do not ride on pads worn to the maker's wear line or rotors below the minimum thickness marked on them. " +
  'Pads contaminated with oil must be replaced, not cleaned. Use only the brake fluid the maker ' +
  'specifies: mineral oil and DOT fluid must never be mixed. Brake work is for a qualified mechanic.';

/** Shown with steering, stem and steerer findings and work. */
export const STEERING_CAUTION =
  'If you feel knocking when braking with the front brake, or the bars turn roughly, have the ' +
  "headset checked. Stem bolts are tightened to the stem maker's specified torque. Do not change " +
  "the stem height on a carbon steerer without the correct expander and the maker's instructions.";

/** Shown with wheels, tyres and axles. */
export const WHEEL_CAUTION =
  'Check that quick-release levers or thru-axles are fully closed before every ride. Inflate tyres ' +
  'within the range printed on both the tyre and the rim; the lower maximum applies.';

/** Shown with borescope stills and frame-interior checkpoints. */
export const SCOPE_CAUTION =
  'Views inside the frame are limited to what the camera can reach. Not seeing corrosion or damage ' + 'in these images does not prove the tube is free of it.';

/** Printed in its own box when the owner declines work we flagged unsafe. */
export const DECLINED_SAFETY_NOTICE = 'You chose not to have this work done. We advise you not to ride the bike until it is fixed.';

/** The words every unsafe item carries on the report and the owner page. */
export const DO_NOT_RIDE = 'Do not ride';
