import type { BandSetValues } from '../../../shared/schemas/band-set';
import type { BandLimits, PressHistory, PressHistoryPoint, PressHistorySeries } from '../../../shared/schemas/manager-figures';
import { CIRCUIT_LEADS } from '../../../shared/schemas/reading';
import { AppError } from '../../lib/errors';
import { visitReference } from '../../../shared/format/visit-reference';
import { findPressForHistory, findPressReadings, type HistoryRow } from './press-history.repository';

type SeriesKind = Pick<PressHistorySeries, 'quantity' | 'circuit' | 'position'>;

/**
 * The in-band and near-edge limits the engine applies (shared/domain/judge-band.ts): a winding
 * is judged by percent from nominal; a voltage by a min–max range widened by its near-edge margin.
 */
export function bandLimits(bands: BandSetValues, kind: SeriesKind): BandLimits {
  if (kind.quantity === 'resistance' && kind.circuit !== 'stator_pair') {
    const w = bands.windings[kind.circuit];
    return {
      nominal: w.nominal,
      inLow: w.nominal * (1 - w.inBandPercent / 100),
      inHigh: w.nominal * (1 + w.inBandPercent / 100),
      edgeLow: w.nominal * (1 - w.nearEdgePercent / 100),
      edgeHigh: w.nominal * (1 + w.nearEdgePercent / 100),
    };
  }
  const range = kind.circuit === 'rotor' ? bands.excitation : bands.statorOutputMagnitude;
  return {
    nominal: null,
    inLow: range.min,
    inHigh: range.max,
    edgeLow: range.min * (1 - range.nearEdgePercent / 100),
    edgeHigh: range.max * (1 + range.nearEdgePercent / 100),
  };
}

const WHERE_LABEL = { control_end: 'control end', sensor_end: 'sensor end' } as const;

function seriesLabel(kind: SeriesKind): string {
  if (kind.quantity === 'resistance') return `${kind.circuit === 'rotor' ? 'Rotor' : 'Stator'} ${CIRCUIT_LEADS[kind.circuit as 'rotor']} resistance, ${WHERE_LABEL[kind.position]}`;
  if (kind.circuit === 'rotor') return `Excitation R1–R2 voltage, ${WHERE_LABEL[kind.position]}`;
  return `Stator output pair √(V(S1–S3)² + V(S2–S4)²), ${WHERE_LABEL[kind.position]}`;
}

// Resistances first, then voltages; within each, rotor before the stators, control end before sensor end.
const ORDER = ['resistance', 'ac_voltage'].flatMap((q) => ['rotor', 'stator_1', 'stator_2', 'stator_pair'].flatMap((c) => ['control_end', 'sensor_end'].map((p) => `${q}:${c}:${p}`)));

export async function pressHistory(pressId: number): Promise<PressHistory> {
  const press = await findPressForHistory(pressId);
  if (!press) throw new AppError(404, 'not_found', 'That press was not found. Pick it again from the list of visits or presses.');
  const rows = await findPressReadings(pressId);

  const visits = new Map<number, PressHistory['visits'][number]>();
  const series = new Map<string, PressHistorySeries>();
  const bandLabel = (r: HistoryRow) => (r.generation ? `${r.generation} v${r.band_version}` : null);

  for (const r of rows) {
    if (!visits.has(r.visit_id)) {
      visits.set(r.visit_id, { id: r.visit_id, reference: visitReference(r.visit_id), startedAt: r.started_at.toISOString(), status: r.status, causeCategory: r.cause_category, bandSetLabel: bandLabel(r) });
    }
    if (!r.quantity || !r.circuit || !r.position) continue;
    // The two stator outputs are judged together by their vector magnitude: one series, not two copies.
    if (r.quantity === 'ac_voltage' && r.circuit === 'stator_2') continue;
    const kind: SeriesKind = { quantity: r.quantity, circuit: r.quantity === 'ac_voltage' && r.circuit === 'stator_1' ? 'stator_pair' : r.circuit, position: r.position };
    const key = `${kind.quantity}:${kind.circuit}:${kind.position}`;
    let s = series.get(key);
    if (!s) {
      s = { key, ...kind, label: seriesLabel(kind), unit: kind.quantity === 'resistance' ? 'Ω' : 'V', points: [] };
      series.set(key, s);
    }
    const figures = r.judgement?.figures;
    const judged = kind.quantity === 'resistance' ? figures?.atReference : figures?.judged;
    const point: PressHistoryPoint = {
      visitId: r.visit_id,
      reference: visitReference(r.visit_id),
      startedAt: r.started_at.toISOString(),
      entered: r.entered ?? '',
      judgedValue: typeof judged === 'number' ? judged : null,
      isOpen: r.is_open ?? false,
      verdict: r.verdict,
      reason: r.reason ?? '',
      band: r.bands ? bandLimits(r.bands, kind) : null,
      bandSetLabel: bandLabel(r),
    };
    s.points.push(point);
  }

  return {
    press: { id: press.id, assetTag: press.asset_tag, model: press.model, siteName: press.site_name, customerName: press.customer_name, sensorGeneration: press.sensor_generation },
    visits: [...visits.values()],
    series: [...series.values()].sort((a, b) => ORDER.indexOf(a.key) - ORDER.indexOf(b.key)),
  };
}
