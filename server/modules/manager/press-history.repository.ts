import { QueryTypes } from 'sequelize';
import type { BandSetValues } from '../../../shared/schemas/band-set';
import type { CauseCategory, Circuit, Position, Quantity, Verdict } from '../../../shared/schemas/reading';
import type { VisitStatus } from '../../../shared/schemas/visit';
import { Visit } from '../visits/visits.model';
import { BoundParams } from './bound-params';

export interface PressRow {
  id: number;
  asset_tag: string;
  model: string;
  sensor_generation: string | null;
  site_name: string;
  customer_name: string;
}

export interface HistoryRow {
  visit_id: number;
  started_at: Date;
  status: VisitStatus;
  cause_category: CauseCategory | null;
  band_set_id: number | null;
  generation: string | null;
  band_version: number | null;
  bands: BandSetValues | null;
  quantity: Quantity | null;
  circuit: Circuit | null;
  position: Position | null;
  entered: string | null;
  value_si: number | null;
  is_open: boolean | null;
  verdict: Verdict | null;
  reason: string | null;
  judgement: { figures?: { atReference?: number | null; judged?: number | null } } | null;
}

const db = () => Visit.sequelize!;

export async function findPressForHistory(pressId: number): Promise<PressRow | undefined> {
  const p = new BoundParams();
  const sql = `
    SELECT p.id, p.asset_tag, p.model, p.sensor_generation, s.name AS site_name, c.name AS customer_name
    FROM presses p JOIN sites s ON s.id = p.site_id JOIN customers c ON c.id = s.customer_id
    WHERE p.id = ${p.add(pressId)}`;
  const [row] = await db().query<PressRow>(sql, { bind: p.values, type: QueryTypes.SELECT });
  return row;
}

/**
 * Every started visit on the press, oldest first, each with its current readings and the band set
 * the visit pinned: a reading is always shown against the band it was judged by, not today's.
 */
export async function findPressReadings(pressId: number): Promise<HistoryRow[]> {
  const p = new BoundParams();
  const sql = `
    SELECT v.id AS visit_id, v.started_at, v.status, v.cause_category,
           b.id AS band_set_id, b.generation, b.version AS band_version, b.bands,
           r.quantity, r.circuit, r.position, r.entry AS entered, r.value_si, r.is_open, r.verdict, r.reason, r.judgement
    FROM visits v
    LEFT JOIN band_sets b ON b.id = v.band_set_id
    LEFT JOIN readings r ON r.visit_id = v.id AND r.superseded_at IS NULL
    WHERE v.press_id = ${p.add(pressId)} AND v.started_at IS NOT NULL
    ORDER BY v.started_at, v.id, r.created_at`;
  return db().query<HistoryRow>(sql, { bind: p.values, type: QueryTypes.SELECT });
}
