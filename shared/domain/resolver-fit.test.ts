import fc from 'fast-check';
import { FC_SEED } from './testing/fast-check-seed';
import { linearRegression, rootMeanSquare } from 'simple-statistics';
import { fitResolverSweep, type SweepSample } from './resolver-fit';

// Readings an RMS meter would show for a resolver obeying K·E·sin θ / K·E·cos θ (standard theory).
const sweep = (amplitude: number, offset: number, angles: number[], distort = (v: number) => v): SweepSample[] =>
  angles.map((crankAngle) => {
    const phase = ((crankAngle + offset) * Math.PI) / 180;
    return {
      crankAngle,
      sine: distort(Math.abs(amplitude * Math.sin(phase))),
      cosine: distort(Math.abs(amplitude * Math.cos(phase))),
    };
  });

const ANGLES = [0, 30, 60, 90, 120, 150, 200, 250, 300];

describe('fitResolverSweep', () => {
  it('recovers amplitude and offset of a sinusoidal resolver with near-zero residual', () => {
    const fit = fitResolverSweep(sweep(2.2, 17, ANGLES));
    expect(fit.amplitude).toBeCloseTo(2.2, 6);
    expect(fit.offset).toBeCloseTo(17, 4);
    expect(fit.residualPercent).toBeLessThan(1e-4);
  });

  it('recovers any amplitude and offset (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.2, max: 10, noNaN: true }), fc.double({ min: 0, max: 179.9, noNaN: true }), (a, phi) => {
        const fit = fitResolverSweep(sweep(a, phi, ANGLES));
        expect(fit.amplitude).toBeCloseTo(a, 4);
        expect(Math.min(Math.abs(fit.offset - phi), 180 - Math.abs(fit.offset - phi))).toBeLessThan(1e-3);
      }),
      { numRuns: 40, seed: FC_SEED },
    );
  });

  it('agrees with simple-statistics least squares when the offset is zero (independent library)', () => {
    const samples = sweep(2.4, 0, ANGLES, (v) => v * 1.01 + 0.002);
    const fit = fitResolverSweep(samples);
    const points = samples.flatMap((p) => {
      const theta = (p.crankAngle * Math.PI) / 180;
      return [[Math.abs(Math.sin(theta)), p.sine], [Math.abs(Math.cos(theta)), p.cosine]] as Array<[number, number]>;
    });
    // With a tiny intercept the slope of an ordinary fit is close to our through-origin amplitude.
    expect(fit.amplitude).toBeCloseTo(linearRegression(points).m, 2);
    const residuals = points.map(([x, y]) => y - fit.amplitude * x);
    // Offset may have moved a hair from 0; allow for it.
    expect(fit.residual).toBeLessThanOrEqual(rootMeanSquare(residuals) + 1e-9);
  });

  it('reports a clear residual for windings that stray from sinusoidal (flattened tops)', () => {
    const flattened = sweep(2.2, 0, ANGLES, (v) => Math.min(v, 1.6));
    expect(fitResolverSweep(flattened).residualPercent).toBeGreaterThan(3);
  });

  it('needs three distinct crank angles', () => {
    expect(() => fitResolverSweep(sweep(2, 0, [10, 190, 10]))).toThrow(RangeError);
  });
});

describe('fitResolverSweep — residual and folding', () => {
  it('residualPercent is residual / amplitude × 100 (flattened tops)', () => {
    const fit = fitResolverSweep(sweep(2.2, 0, ANGLES, (v) => Math.min(v, 1.6)));
    expect(fit.residual).toBeGreaterThan(0);
    expect(fit.residualPercent).toBeCloseTo((fit.residual / fit.amplitude) * 100, 10);
  });

  it('residual is the RMS misfit over all 2N readings at the fitted amplitude and offset (simple-statistics RMS)', () => {
    const samples = sweep(2, 25, ANGLES, (v) => v * 1.02 + 0.01);
    const fit = fitResolverSweep(samples);
    const misfits = samples.flatMap((p) => {
      const phase = ((p.crankAngle + fit.offset) * Math.PI) / 180;
      return [p.sine - fit.amplitude * Math.abs(Math.sin(phase)), p.cosine - fit.amplitude * Math.abs(Math.cos(phase))];
    });
    expect(fit.residual).toBeGreaterThan(0.001);
    expect(fit.residual).toBeCloseTo(rootMeanSquare(misfits), 9);
  });

  it('an all-zero sweep has amplitude 0 and residualPercent 0 (no division by zero)', () => {
    const fit = fitResolverSweep(sweep(0, 0, [0, 45, 90]));
    expect(fit.amplitude).toBe(0);
    expect(fit.residualPercent).toBe(0);
  });

  it('folds the offset into [0, 180): a 170° offset is found as 170°, and negative crank angles work', () => {
    expect(fitResolverSweep(sweep(1.5, 170, ANGLES)).offset).toBeCloseTo(170, 3);
    expect(fitResolverSweep(sweep(1.5, 40, [-90, -60, -30, 0, 30])).offset).toBeCloseTo(40, 3);
  });

  it('counts crank angles 180° apart as the same angle (RMS readings repeat every half turn)', () => {
    expect(() => fitResolverSweep(sweep(2, 0, [10, 190, 100, 280]))).toThrow(/three or more distinct crank angles/);
    expect(() => fitResolverSweep(sweep(2, 0, [-170, 10, 100, 280]))).toThrow(/three or more/);
    expect(() => fitResolverSweep(sweep(2, 0, [10, 100, 55]))).not.toThrow();
  });
});
