import { TorqueEntryRequestSchema } from './work-log';

const entry = {
  fastener: 'Stem steerer clamp bolts',
  specified: { min: 5, unit: 'nm' },
  applied: { value: 5, unit: 'nm' },
  specSource: "Maker's value printed on the stem",
  tool: 'TW-02',
};

describe('TorqueEntryRequestSchema', () => {
  it('accepts a complete entry', () => {
    expect(TorqueEntryRequestSchema.safeParse(entry).success).toBe(true);
  });

  it('cannot be saved without a spec source (CHECKS.md B.4 test idea)', () => {
    expect(TorqueEntryRequestSchema.safeParse({ ...entry, specSource: '' }).success).toBe(false);
    const noSource: Record<string, unknown> = { ...entry };
    delete noSource.specSource;
    expect(TorqueEntryRequestSchema.safeParse(noSource).success).toBe(false);
  });

  it('rejects negative or zero torque and unknown units', () => {
    expect(TorqueEntryRequestSchema.safeParse({ ...entry, applied: { value: -5, unit: 'nm' } }).success).toBe(false);
    expect(TorqueEntryRequestSchema.safeParse({ ...entry, specified: { min: 0, unit: 'nm' } }).success).toBe(false);
    expect(TorqueEntryRequestSchema.safeParse({ ...entry, applied: { value: 5, unit: 'J' } }).success).toBe(false);
  });
});

describe('TorqueEntryRequestSchema: wrench calibration and threadlocker', () => {
  it('takes a calibration date and a threadlocker kind', () => {
    const r = TorqueEntryRequestSchema.parse({ ...entry, toolCalibratedOn: '2025-01-15', threadlocker: 'blue_medium' });
    expect(r).toMatchObject({ toolCalibratedOn: '2025-01-15', threadlocker: 'blue_medium' });
  });

  it('rejects a calibration date that is not YYYY-MM-DD and an unknown threadlocker', () => {
    expect(TorqueEntryRequestSchema.safeParse({ ...entry, toolCalibratedOn: '15/01/2025' }).success).toBe(false);
    expect(TorqueEntryRequestSchema.safeParse({ ...entry, threadlocker: 'glue' }).success).toBe(false);
  });
});
