/** Bike specification enums (DESIGN.md: Bike). Specs drive the checklist and the limits. */
export const FRAME_MATERIALS = ['steel', 'aluminium', 'carbon', 'titanium', 'other'] as const;
export type FrameMaterial = (typeof FRAME_MATERIALS)[number];
export const FRAME_MATERIAL_LABELS: Readonly<Record<FrameMaterial, string>> = {
  steel: 'Steel',
  aluminium: 'Aluminium',
  carbon: 'Carbon',
  titanium: 'Titanium',
  other: 'Other',
};

export const BRAKE_TYPES = ['rim', 'mechanical_disc', 'hydraulic_disc'] as const;
export type BrakeType = (typeof BRAKE_TYPES)[number];
export const BRAKE_TYPE_LABELS: Readonly<Record<BrakeType, string>> = {
  rim: 'Rim',
  mechanical_disc: 'Mechanical disc',
  hydraulic_disc: 'Hydraulic disc',
};

export const CABLE_ROUTINGS = ['external', 'internal'] as const;
export type CableRouting = (typeof CABLE_ROUTINGS)[number];
export const CABLE_ROUTING_LABELS: Readonly<Record<CableRouting, string>> = {
  external: 'External',
  internal: 'Internal',
};

export const DROPOUT_TYPES = ['vertical', 'horizontal'] as const;
export type DropoutType = (typeof DROPOUT_TYPES)[number];
export const DROPOUT_TYPE_LABELS: Readonly<Record<DropoutType, string>> = {
  vertical: 'Vertical',
  horizontal: 'Horizontal',
};

/** Drivetrain speeds a bike can have: single speed up to 13. */
export const MIN_DRIVETRAIN_SPEEDS = 1;
export const MAX_DRIVETRAIN_SPEEDS = 13;
