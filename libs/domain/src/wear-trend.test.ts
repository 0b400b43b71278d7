import { areaCautions, measurementCautions } from './cautions';
import { BRAKE_CAUTION, CARBON_CAUTION, STEERING_CAUTION } from './safety';
import { fraction, type Fraction } from 'mathjs';
import { chainDueEstimate, type ChainTrendPoint, trendValue } from './wear-trend';

/** Independent check: the same least-squares line in exact fractions (mathjs Fraction), due day = last day + ceil(gap / slope). */
function exactDueDay(points: ChainTrendPoint[], limitPct: number): number | null {
  const f = (x: number): Fraction => fraction(String(x));
  const n = f(points.length);
  const mx = points.reduce((s, p) => s.add(f(p.day)), f(0)).div(n);
  const my = points.reduce((s, p) => s.add(f(p.pct)), f(0)).div(n);
  let sxy = f(0);
  let sxx = f(0);
  for (const p of points) {
    const dx = f(p.day).sub(mx);
    sxy = sxy.add(dx.mul(f(p.pct).sub(my)));
    sxx = sxx.add(dx.mul(dx));
  }
  const slope = sxy.div(sxx);
  if (slope.compare(0) <= 0) return null;
  const last = points[points.length - 1];
  return last.day + Number(f(limitPct).sub(f(last.pct)).div(slope).ceil().valueOf());
}

describe('trendValue', () => {
  it('plots a ruler chain reading as elongation % with the speed-dependent limit', () => {
    // 24 pitches = 304.8 mm nominal (12.7 mm pitch, CHECKS.md B.1); 307.2 mm → (307.2 − 304.8)/304.8 = 0.7874 % (by hand).
    const t = trendValue({ kind: 'chain_elongation', method: 'ruler', pitches: 24, lengthValue: 307.2, lengthUnit: 'mm' }, { drivetrainSpeeds: 11 });
    expect(t).toMatchObject({ key: 'chain_elongation', unit: '%', value: 0.7874, limit: 0.5 });
  });

  it('keeps front and rear pads apart and carries the entered minimum as the limit', () => {
    expect(trendValue({ kind: 'pad_thickness', mm: 1.2, minimumMm: 0.5, position: 'rear' }, { drivetrainSpeeds: 9 })).toMatchObject({
      key: 'pad_thickness:rear',
      value: 1.2,
      limit: 0.5,
    });
  });

  it('has no trend for graded bearing play', () => {
    expect(trendValue({ kind: 'bearing_play', grade: 'slight', bearing: 'headset' }, { drivetrainSpeeds: 9 })).toBeNull();
  });
});

describe('chainDueEstimate (least squares, checked by hand; common practice, no source)', () => {
  it('projects a steady 0.1 % per 100 days to the 0.5 % limit', () => {
    // Points (0, 0.1), (100, 0.2), (200, 0.3): slope 0.001 %/day; from 0.3 % at day 200, 0.2 % more takes 200 days → day 400.
    const e = chainDueEstimate(
      [
        { day: 100, pct: 0.2 },
        { day: 0, pct: 0.1 },
        { day: 200, pct: 0.3 },
      ],
      0.5,
    );
    expect(e).toEqual({ dueDay: 400, alreadyDue: false, pctPerDay: expect.closeTo(0.001, 12), pointsUsed: 3 });
  });

  it('restarts the trend after a replaced chain', () => {
    // The drop from 0.8 to 0.05 marks a new chain; only (300, 0.05) and (400, 0.15) count: 0.001 %/day → day 400 + 350 = 750.
    const e = chainDueEstimate(
      [
        { day: 0, pct: 0.4 },
        { day: 200, pct: 0.8 },
        { day: 300, pct: 0.05 },
        { day: 400, pct: 0.15 },
      ],
      0.5,
    );
    expect(e).toMatchObject({ dueDay: 750, pointsUsed: 2 });
  });

  it('says already due at or past the limit, and nothing for one reading or a flat trend', () => {
    expect(
      chainDueEstimate(
        [
          { day: 0, pct: 0.3 },
          { day: 50, pct: 0.5 },
        ],
        0.5,
      ),
    ).toMatchObject({ dueDay: 50, alreadyDue: true });
    expect(chainDueEstimate([{ day: 0, pct: 0.3 }], 0.5)).toBeNull();
    expect(
      chainDueEstimate(
        [
          { day: 0, pct: 0.3 },
          { day: 90, pct: 0.3 },
        ],
        0.5,
      ),
    ).toBeNull();
    expect(
      chainDueEstimate(
        [
          { day: 10, pct: 0.2 },
          { day: 10, pct: 0.3 },
        ],
        0.5,
      ),
    ).toBeNull();
  });
});

describe('chainDueEstimate corrections (worked numbers, exact-fraction check with mathjs)', () => {
  it.each([
    // 0.20 % on day 0, 0.30 % on day 100: 0.001 %/day; 0.2 % more to 0.5 % takes 200 days → day 300 (floating point alone gives 301).
    {
      name: 'two readings, 0.1 % per 100 days',
      points: [
        { day: 0, pct: 0.2 },
        { day: 100, pct: 0.3 },
      ],
      due: 300,
    },
    // 0.1, 0.2, 0.3 % on days 0, 100, 200 → day 400 (by hand).
    {
      name: 'three readings on a line',
      points: [
        { day: 0, pct: 0.1 },
        { day: 100, pct: 0.2 },
        { day: 200, pct: 0.3 },
      ],
      due: 400,
    },
    // 0.3 % to 0.4 % over 50 days: 0.002 %/day; 0.1 % more takes 50 days → day 100 + 50 = 150.
    {
      name: 'faster wear',
      points: [
        { day: 50, pct: 0.3 },
        { day: 100, pct: 0.4 },
      ],
      due: 150,
    },
    // 0.07 % over 70 days: 0.001 %/day; 0.43 % left from 0.07 % → 430 days → day 500.
    {
      name: 'a new chain',
      points: [
        { day: 0, pct: 0 },
        { day: 70, pct: 0.07 },
      ],
      due: 500,
    },
  ])('$name → day $due', ({ points, due }) => {
    expect(exactDueDay(points, 0.5)).toBe(due);
    expect(chainDueEstimate(points, 0.5)).toMatchObject({ dueDay: due, alreadyDue: false });
  });

  it.each([
    // Three visits with the same reading: floating point gives a slope of about 1e-19 %/day, not 0.
    {
      name: 'flat at 0.1 % over three visits',
      points: [
        { day: 0, pct: 0.1 },
        { day: 90, pct: 0.1 },
        { day: 400, pct: 0.1 },
      ],
    },
    {
      name: 'flat at 0.2 % on Unix days',
      points: [
        { day: 19000, pct: 0.2 },
        { day: 19120, pct: 0.2 },
        { day: 19365, pct: 0.2 },
      ],
    },
    {
      name: 'flat at 0.3 % over three visits',
      points: [
        { day: 0, pct: 0.3 },
        { day: 120, pct: 0.3 },
        { day: 365, pct: 0.3 },
      ],
    },
    // Falling a little (a re-measure, not a new chain: the drop is under 0.05 %).
    {
      name: 'falling slightly',
      points: [
        { day: 0, pct: 0.34 },
        { day: 100, pct: 0.32 },
        { day: 200, pct: 0.31 },
      ],
    },
  ])('no due date when the trend is $name', ({ points }) => {
    expect(exactDueDay(points, 0.5)).toBeNull();
    expect(chainDueEstimate(points, 0.5)).toBeNull();
  });
});

describe('cautions (CHECKS.md D: defer to the maker, local rules and a qualified mechanic)', () => {
  it('puts the brake caution on brakes and the carbon caution on a carbon frame', () => {
    expect(areaCautions('brakes')).toEqual([BRAKE_CAUTION]);
    expect(areaCautions('steering_headset', { carbonFrame: true })).toEqual([STEERING_CAUTION, CARBON_CAUTION]);
    expect(areaCautions('drivetrain')).toEqual([]);
  });

  it('puts the brake caution on brake cables only', () => {
    expect(measurementCautions({ kind: 'cable_diameter', cable: 'brake', mm: 1.5 })).toEqual([BRAKE_CAUTION]);
    expect(measurementCautions({ kind: 'cable_diameter', cable: 'shift', mm: 1.1 })).toEqual([]);
  });
});
