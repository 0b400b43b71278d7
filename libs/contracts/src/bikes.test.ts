import { BikeInputSchema, NewBikeInputSchema } from './bikes';

const bike = {
  customerId: 3,
  maker: 'Harbour Cycles',
  model: 'Tern Road',
  year: 2021,
  frameMaterial: 'aluminium',
  size: '56',
  colour: 'Teal',
  serialNumber: 'HC21-00931',
  drivetrainSpeeds: 11,
  brakeType: 'hydraulic_disc',
  cableRouting: 'internal',
  dropoutType: 'vertical',
  tyreSize: '28-622',
};

const issuesFor = (value: unknown) => {
  const result = BikeInputSchema.safeParse(value);
  return result.success ? [] : result.error.issues.map((i) => i.path.join('.'));
};

describe('BikeInputSchema', () => {
  it('accepts a complete bike and empties optional text to null', () => {
    const parsed = BikeInputSchema.parse({ ...bike, size: '', colour: '  ', serialNumber: undefined, tyreSize: '' });
    expect(parsed).toMatchObject({ size: null, colour: null, serialNumber: null, tyreSize: null, drivetrainSpeeds: 11 });
  });

  it.each([1, 13])('accepts %s speeds', (drivetrainSpeeds) => {
    expect(issuesFor({ ...bike, drivetrainSpeeds })).toEqual([]);
  });

  it.each([0, 14, 10.5])('rejects %s speeds (1–13)', (drivetrainSpeeds) => {
    expect(issuesFor({ ...bike, drivetrainSpeeds })).toEqual(['drivetrainSpeeds']);
  });

  it.each(['abc', '700x28c', '622-28', '28 622'])('rejects tyre size %j (ISO 5775 width-BSD, e.g. 28-622)', (tyreSize) => {
    expect(issuesFor({ ...bike, tyreSize })).toEqual(['tyreSize']);
  });

  it('accepts model years from 1900 to next year only', () => {
    const next = new Date().getFullYear() + 1;
    expect(issuesFor({ ...bike, year: next })).toEqual([]);
    expect(issuesFor({ ...bike, year: next + 1 })).toEqual(['year']);
    expect(issuesFor({ ...bike, year: 1899 })).toEqual(['year']);
    expect(BikeInputSchema.parse({ ...bike, year: null }).year).toBeNull();
  });

  it('rejects unknown frame materials and brake types, and a missing maker', () => {
    expect(issuesFor({ ...bike, frameMaterial: 'bamboo' })).toEqual(['frameMaterial']);
    expect(issuesFor({ ...bike, brakeType: 'drum' })).toEqual(['brakeType']);
    expect(issuesFor({ ...bike, maker: '   ' })).toEqual(['maker']);
  });

  it('a new bike at booking-in has no customerId', () => {
    const rest: Record<string, unknown> = { ...bike };
    delete rest.customerId;
    expect(NewBikeInputSchema.safeParse(rest).success).toBe(true);
  });
});
