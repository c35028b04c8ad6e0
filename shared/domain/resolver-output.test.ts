import fc from 'fast-check';
import { FC_SEED } from './testing/fast-check-seed';
import { analyseResolverOutput } from './resolver-output';

/*
 * Standard resolver theory (MathWorks Motor Control Blockset "Resolver Decoder" reference page;
 * Modelica Standard Library SinCosResolver): with excitation E, the sine stator gives K·E·sin θ and
 * the cosine stator K·E·cos θ, so √(Vsin² + Vcos²) = K·E and θ = atan2(Vsin, Vcos).
 */
const stators = (excitation: number, ratio: number, degrees: number) => {
  const theta = (degrees * Math.PI) / 180;
  return { sine: ratio * excitation * Math.sin(theta), cosine: ratio * excitation * Math.cos(theta) };
};

describe('analyseResolverOutput', () => {
  it('E = 7.0 V, K = 0.5, θ = 30°: Vsin 1.750 V, Vcos 3.031 V, magnitude 3.5 V (REFERENCES, computed)', () => {
    const { sine, cosine } = stators(7, 0.5, 30);
    expect(sine).toBeCloseTo(1.75, 3);
    expect(cosine).toBeCloseTo(3.031, 3);
    const out = analyseResolverOutput(1.75, 3.031, 7);
    expect(out.magnitude).toBeCloseTo(3.5, 3);
    expect(out.transformationRatio).toBeCloseTo(0.5, 3);
    expect(out.firstQuadrantAngle).toBeCloseTo(30, 1);
  });

  it('θ = 135° reads 2.475 V and −2.475 V; an RMS meter shows both positive, so only 45° can be told (REFERENCES)', () => {
    const { sine, cosine } = stators(7, 0.5, 135);
    expect(sine).toBeCloseTo(2.475, 3);
    expect(cosine).toBeCloseTo(-2.475, 3);
    const out = analyseResolverOutput(Math.abs(sine), Math.abs(cosine), 7);
    expect(out.magnitude).toBeCloseTo(3.5, 9);
    expect(out.firstQuadrantAngle).toBeCloseTo(45, 9);
  });

  it('the magnitude is the same at every shaft angle: sin²θ + cos²θ = 1 (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 30, noNaN: true }),
        fc.double({ min: 0.05, max: 2, noNaN: true }),
        fc.double({ min: -720, max: 720, noNaN: true }),
        (excitation, ratio, degrees) => {
          const { sine, cosine } = stators(excitation, ratio, degrees);
          const out = analyseResolverOutput(Math.abs(sine), Math.abs(cosine), excitation);
          expect(out.magnitude).toBeCloseTo(ratio * excitation, 9);
          expect(out.transformationRatio!).toBeCloseTo(ratio, 9);
        },
      ), { seed: FC_SEED },
    );
  });

  it('recovers a first-quadrant angle exactly (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 90, noNaN: true }), (degrees) => {
        const { sine, cosine } = stators(4.25, 0.5, degrees);
        expect(analyseResolverOutput(sine, cosine).firstQuadrantAngle).toBeCloseTo(degrees, 8);
      }), { seed: FC_SEED },
    );
  });

  it('reports no ratio without an excitation reading', () => {
    expect(analyseResolverOutput(1, 1).transformationRatio).toBeNull();
  });
});

describe('analyseResolverOutput — ratio and angle edges', () => {
  it('no ratio without a positive excitation', () => {
    expect(analyseResolverOutput(1.75, 3.031).transformationRatio).toBeNull();
    expect(analyseResolverOutput(1.75, 3.031, 0).transformationRatio).toBeNull();
    expect(analyseResolverOutput(1.75, 3.031, -7).transformationRatio).toBeNull();
  });

  it('θ = 90°: all the output on the sine stator → 90°; θ = 0° → 0° (standard resolver theory)', () => {
    expect(analyseResolverOutput(3.5, 0, 7).firstQuadrantAngle).toBeCloseTo(90, 12);
    expect(analyseResolverOutput(0, 3.5, 7).firstQuadrantAngle).toBeCloseTo(0, 12);
  });

  it('a negative (phase-reversed) value is read by its size: −1.75 and 3.031 give 30° and 3.5 V', () => {
    const out = analyseResolverOutput(-1.75, -3.031, 7);
    expect(out.firstQuadrantAngle).toBeCloseTo(30, 1);
    expect(out.magnitude).toBeCloseTo(3.5, 3);
  });
});
