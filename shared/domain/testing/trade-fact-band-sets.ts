import type { BandSetValues, WindingBand } from '../../schemas/band-set';
import type { GenerationCandidate } from '../infer-generation';

/*
 * TEST-ONLY CHECK VALUES, never seeded. Facts of the trade — common practice, no published source:
 *   older-generation resolver: rotor about 89 Ω, each stator about 70 Ω (de-energized);
 *   newer-generation resolver: rotor about 36 Ω, each stator about 90 Ω;
 *   energized: excitation across the rotor about 4 to 4.5 V AC; the two stator outputs together
 *   2 to 2.5 V AC (read here as the vector magnitude √(V(S1–S3)² + V(S2–S4)²), which gives a ratio near the
 *   0.5 that resolver references call common).
 * The tolerances below are the tests' own choice ("about"), not part of the stated facts.
 */
const winding = (nominal: number): WindingBand => ({
  nominal,
  inBandPercent: 10,
  nearEdgePercent: 20,
  shortBelow: nominal * 0.1,
  openAbove: 10_000,
});

const bands = (label: string, rotor: number, stator: number): BandSetValues => ({
  label,
  referenceTemperatureC: 20,
  windings: { rotor: winding(rotor), stator_1: winding(stator), stator_2: winding(stator) },
  statorBalancePercent: 5,
  excitation: { min: 4.0, max: 4.5, nearEdgePercent: 5 },
  statorOutputMagnitude: { min: 2.0, max: 2.5, nearEdgePercent: 5 },
  invented: false,
  note: 'Test check values: common practice, no published source.',
});

export const OLDER_GENERATION = bands('Older generation (trade check values)', 89, 70);
export const NEWER_GENERATION = bands('Newer generation (trade check values)', 36, 90);

export const TRADE_CANDIDATES: GenerationCandidate[] = [
  { generation: 'older', values: OLDER_GENERATION },
  { generation: 'newer', values: NEWER_GENERATION },
];
