import type { BandSetValues } from '../schemas/band-set';
import { CIRCUITS, type Circuit } from '../schemas/reading';
import { correctCopperResistance } from './temperature-correction';
import type { Celsius, Ohms } from './units';

export interface GenerationCandidate {
  generation: string;
  values: BandSetValues;
}

export interface GenerationScore {
  generation: string;
  label: string;
  /** Share of the evidence among the candidates, 0–1. */
  confidence: number;
  /** Every reading lies within this generation's near-edge tolerance. */
  fitsAllReadings: boolean;
  /** Root-mean-square deviation from the nominals, in units of each winding's near-edge tolerance. */
  distance: number;
}

export interface GenerationInference {
  best: GenerationScore | null;
  ranked: GenerationScore[];
  reason: string;
}

/**
 * Suggests the sensor generation whose winding nominals best match de-energized readings (with the
 * cable already subtracted). Given the winding temperature, readings are corrected to each
 * candidate's own reference temperature; without it they are compared as measured. Each reading contributes z = deviation / near-edge
 * tolerance; confidence is the normalised Gaussian weight exp(−Σz²/2) over the candidates, so it
 * says which generation fits better, and fitsAllReadings says whether it fits at all.
 */
export function inferGeneration(
  readings: Partial<Record<Circuit, Ohms>>,
  candidates: readonly GenerationCandidate[],
  measuredAtC?: Celsius,
): GenerationInference {
  const circuits = CIRCUITS.filter((c) => {
    const value = readings[c];
    return value !== undefined && Number.isFinite(value) && value > 0;
  });
  if (circuits.length === 0 || candidates.length === 0) {
    return { best: null, ranked: [], reason: 'No usable resistance readings (or no band sets) to infer a generation from.' };
  }
  const scored = candidates.map(({ generation, values }) => {
    let sumSquares = 0;
    let fitsAllReadings = true;
    for (const circuit of circuits) {
      const band = values.windings[circuit];
      const measured = readings[circuit]!;
      const value = measuredAtC === undefined ? measured : correctCopperResistance(measured, measuredAtC, values.referenceTemperatureC);
      const deviation = (value - band.nominal) / band.nominal;
      const z = deviation / (band.nearEdgePercent / 100);
      sumSquares += z * z;
      if (Math.abs(z) > 1) fitsAllReadings = false;
    }
    return { generation, label: values.label, sumSquares, fitsAllReadings, distance: Math.sqrt(sumSquares / circuits.length) };
  });
  // Subtract the smallest exponent first so far-off candidates do not underflow every weight to 0.
  const least = Math.min(...scored.map((s) => s.sumSquares));
  const weights = scored.map((s) => Math.exp(-(s.sumSquares - least) / 2));
  const total = weights.reduce((a, b) => a + b, 0);
  const ranked: GenerationScore[] = scored
    .map((s, i) => ({
      generation: s.generation,
      label: s.label,
      confidence: weights[i]! / total,
      fitsAllReadings: s.fitsAllReadings,
      distance: s.distance,
    }))
    .sort((a, b) => b.confidence - a.confidence || a.distance - b.distance);
  const top = ranked[0]!;
  const best = top.fitsAllReadings ? top : null;
  const share = `${(top.confidence * 100).toFixed(0)} %`;
  const reason = best
    ? `The readings match ${top.label} (confidence ${share}); confirm against the sensor before relying on it.`
    : `No generation's bands contain every reading; the nearest is ${top.label}. The sensor or cable may be faulty: do not infer the generation from these readings.`;
  return { best, ranked, reason };
}
