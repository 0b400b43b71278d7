import { DEFAULT_CHECKPOINTS, checkpointsForArea, checkpointsForBike, findCheckpoint } from './checkpoints';
import { INSPECTION_AREAS, INSPECTION_AREA_LABELS, MEASUREMENT_KINDS, MEASUREMENT_KIND_LABELS, isInspectionArea } from './inspection-areas';

describe('inspection areas (DESIGN.md)', () => {
  it('have the screen labels in walk-round order', () => {
    expect(INSPECTION_AREAS.map((a) => INSPECTION_AREA_LABELS[a])).toEqual([
      'Frame & fork',
      'Steering & headset',
      'Drivetrain',
      'Brakes',
      'Wheels & tyres',
      'Cables & housing',
      'Bearings',
      'Contact points',
      'Frame interior (scope)',
    ]);
    expect(isInspectionArea('brakes')).toBe(true);
    expect(isInspectionArea('whole_bike')).toBe(false);
  });

  it('label every measurement kind', () => {
    for (const k of MEASUREMENT_KINDS) expect(MEASUREMENT_KIND_LABELS[k].length).toBeGreaterThan(3);
  });
});

describe('DEFAULT_CHECKPOINTS (common practice, no source; CHECKS.md A.2/A.5)', () => {
  it('have unique keys and cover every area', () => {
    const keys = DEFAULT_CHECKPOINTS.map((c) => c.key);
    expect(new Set(keys).size).toBe(keys.length);
    for (const area of INSPECTION_AREAS) expect(checkpointsForArea(area).length).toBeGreaterThan(0);
  });

  it('use every measurement kind somewhere', () => {
    const used = new Set(DEFAULT_CHECKPOINTS.flatMap((c) => c.measurementKinds));
    expect([...used].sort()).toEqual([...MEASUREMENT_KINDS].sort());
  });

  it('flag brakes and the steering and clamp checks safety-critical', () => {
    expect(checkpointsForArea('brakes').every((c) => c.safetyCritical)).toBe(true);
    expect(checkpointsForArea('steering_headset').every((c) => c.safetyCritical)).toBe(true);
    for (const key of ['bar_stem_clamp', 'lever_clamps', 'saddle_clamp', 'seatpost_insertion', 'headset_play', 'wheel_retention', 'brake_cable']) {
      expect(findCheckpoint(key)?.safetyCritical).toBe(true);
    }
  });

  it('require both a front and a rear brake status (ISO 4210-2 4.6.1: two independent brakes)', () => {
    expect(findCheckpoint('front_brake_function')?.area).toBe('brakes');
    expect(findCheckpoint('rear_brake_function')?.area).toBe('brakes');
  });

  it('put the expected readings on the expected checkpoints', () => {
    expect(findCheckpoint('chain_wear')?.measurementKinds).toEqual(['chain_elongation']);
    expect(findCheckpoint('front_pad_thickness')?.measurementKinds).toEqual(['pad_thickness']);
    expect(findCheckpoint('tyre_clearance')?.measurementKinds).toEqual(['tyre_clearance']);
    expect(findCheckpoint('stem_steerer_clamp')?.measurementKinds).toEqual(['stem_gap']);
    expect(findCheckpoint('nope')).toBeUndefined();
  });
});

describe('checkpointsForBike', () => {
  const keys = (brakeType: 'rim' | 'mechanical_disc' | 'hydraulic_disc', drivetrainSpeeds = 11) =>
    checkpointsForBike({ brakeType, drivetrainSpeeds }).map((c) => c.key);

  it('drops rotor and hose checks on rim brakes, keeps pads', () => {
    expect(keys('rim')).not.toContain('front_rotor_thickness');
    expect(keys('rim')).not.toContain('hoses_fluid');
    expect(keys('rim')).toContain('front_pad_thickness');
    expect(keys('rim')).toContain('brake_cable');
  });

  it('drops brake cable checks on hydraulic brakes, keeps hoses and rotors', () => {
    expect(keys('hydraulic_disc')).not.toContain('brake_cable');
    expect(keys('hydraulic_disc')).toContain('hoses_fluid');
    expect(keys('hydraulic_disc')).toContain('rear_rotor_thickness');
  });

  it('drops shifting checks on a single-speed, never the brake function checks', () => {
    expect(keys('mechanical_disc', 1)).not.toContain('shifting');
    expect(keys('mechanical_disc', 11)).toContain('shifting');
    for (const brake of ['rim', 'mechanical_disc', 'hydraulic_disc'] as const) {
      expect(keys(brake, 1)).toEqual(expect.arrayContaining(['front_brake_function', 'rear_brake_function', 'chain_wear']));
    }
  });
});
