import type { Degrees, Percent, Volts } from './units';

/** RMS stator readings taken with the crank at a known angle. */
export interface SweepSample {
  crankAngle: Degrees;
  sine: Volts;
  cosine: Volts;
}

export interface SweepFit {
  amplitude: Volts;
  /** Angle added to the crank angle to give the electrical angle, folded into [0, 180). */
  offset: Degrees;
  /** Root-mean-square misfit over all 2N readings. */
  residual: Volts;
  /** residual / amplitude: how far the windings stray from sinusoidal. */
  residualPercent: Percent;
}

const RAD = Math.PI / 180;

/** Least-squares amplitude for a fixed offset (closed form) and the sum of squared misfits. */
function fitAmplitude(samples: readonly SweepSample[], offset: Degrees): { amplitude: number; sse: number } {
  let numerator = 0;
  for (const p of samples) {
    const phase = (p.crankAngle + offset) * RAD;
    numerator += Math.abs(p.sine) * Math.abs(Math.sin(phase)) + Math.abs(p.cosine) * Math.abs(Math.cos(phase));
  }
  // Σ(sin² + cos²) = N, so the normal equation's denominator is the sample count.
  const amplitude = numerator / samples.length;
  let sse = 0;
  for (const p of samples) {
    const phase = (p.crankAngle + offset) * RAD;
    sse += (Math.abs(p.sine) - amplitude * Math.abs(Math.sin(phase))) ** 2;
    sse += (Math.abs(p.cosine) - amplitude * Math.abs(Math.cos(phase))) ** 2;
  }
  return { amplitude, sse };
}

/**
 * Fits |A·sin(θ + φ)| and |A·cos(θ + φ)| to RMS readings at several crank angles. The offset is
 * found by a 1° scan then golden-section refinement; the amplitude is exact for each offset.
 */
export function fitResolverSweep(samples: readonly SweepSample[]): SweepFit {
  const angles = new Set(samples.map((p) => (((p.crankAngle % 180) + 180) % 180).toFixed(3)));
  if (angles.size < 3) throw new RangeError('A sweep fit needs readings at three or more distinct crank angles.');
  let best = 0;
  let bestSse = Infinity;
  for (let offset = 0; offset < 180; offset += 1) {
    const { sse } = fitAmplitude(samples, offset);
    if (sse < bestSse) [best, bestSse] = [offset, sse];
  }
  let lo = best - 1;
  let hi = best + 1;
  const golden = (Math.sqrt(5) - 1) / 2;
  while (hi - lo > 1e-7) {
    const a = hi - golden * (hi - lo);
    const b = lo + golden * (hi - lo);
    if (fitAmplitude(samples, a).sse < fitAmplitude(samples, b).sse) hi = b;
    else lo = a;
  }
  const offset = (lo + hi) / 2;
  const { amplitude, sse } = fitAmplitude(samples, offset);
  const residual = Math.sqrt(sse / (2 * samples.length));
  return {
    amplitude,
    offset: ((offset % 180) + 180) % 180,
    residual,
    residualPercent: amplitude > 0 ? (residual / amplitude) * 100 : 0,
  };
}
