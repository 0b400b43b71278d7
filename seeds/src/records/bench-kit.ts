/** What the demo visits share: the Lantern mechanics, measurement shorthands and the usual torque source. */
import type { MeasurementInput } from '@benchproof/domain';

export const TOBIN = 'tobin@lantern-spoke.test';
export const INES = 'ines@lantern-spoke.test';
export const gauge = (gaugePct: number): MeasurementInput => ({ kind: 'chain_elongation', method: 'gauge', gaugePct });
export const pad = (position: 'front' | 'rear', mm: number): MeasurementInput => ({ kind: 'pad_thickness', mm, minimumMm: 0.5, position });
export const SHOP_MANUAL = "Component maker's printed value";
