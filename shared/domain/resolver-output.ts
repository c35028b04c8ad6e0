import type { Degrees, Volts } from './units';

export interface ResolverOutput {
  /** √(V(S1–S3)² + V(S2–S4)²): the same at every shaft angle, so this is what is judged. */
  magnitude: Volts;
  /** magnitude / excitation; null without an excitation reading. */
  transformationRatio: number | null;
  /**
   * Electrical angle folded into 0–90°: an RMS meter cannot see the phase reversal that tells
   * the quadrants apart.
   */
  firstQuadrantAngle: Degrees;
}

const toDegrees = (radians: number): Degrees => (radians * 180) / Math.PI;

/** Vector magnitude, transformation ratio and first-quadrant angle from RMS meter readings. */
export function analyseResolverOutput(sine: Volts, cosine: Volts, excitation?: Volts): ResolverOutput {
  const s = Math.abs(sine);
  const c = Math.abs(cosine);
  const magnitude = Math.hypot(s, c);
  const transformationRatio = excitation !== undefined && excitation > 0 ? magnitude / excitation : null;
  return { magnitude, transformationRatio, firstQuadrantAngle: toDegrees(Math.atan2(s, c)) };
}
