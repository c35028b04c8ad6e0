import { QueryTypes, type Sequelize } from 'sequelize';
import type { CauseCategory, Verdict } from '../shared/schemas/reading';
import type { VisitStatus } from '../shared/schemas/visit';

export interface RawVisit {
  pressId: number;
  technicianId: number;
  status: VisitStatus;
  startedAt: string | null;
  closedAt?: string | null;
  cause?: CauseCategory | null;
  fault?: string;
  actions?: string | null;
  labourMinutes?: number | null;
  /** Verdicts of current readings, stored while the visit was still open (the database refuses them later). */
  verdicts?: Verdict[];
  /** A closed visit that left the press locked out (otherwise a closed visit returned it to production). */
  lockedOut?: boolean;
}

/**
 * Writes a visit row straight into the database with the timestamps a test needs (the API always
 * stamps "now"). Readings are added while the visit is in progress, then the status is moved along
 * the allowed path, so every database rule still holds.
 */
export async function insertVisit(sequelize: Sequelize, v: RawVisit): Promise<number> {
  const finalStatus = v.status;
  // A cancelled visit was open first: it moves there by the status machine, with who, when and why.
  const firstStatus = finalStatus === 'cancelled' ? 'in_progress' : v.verdicts?.length && finalStatus !== 'draft' ? 'in_progress' : finalStatus;
  const closedOnce = ['closed', 'approved', 'returned'].includes(finalStatus);
  const asLeft = closedOnce ? (v.lockedOut ? 'locked_out' : 'returned_to_production') : null;
  const lockedOut = v.lockedOut ? JSON.stringify({ reason: 'Made up for tests', waitsFor: 'board' }) : null;
  const [row] = await sequelize.query<{ id: number }>(
    `INSERT INTO visits (press_id, technician_id, status, fault_displayed, started_at, closed_at, cause_category, actions_taken, labour_minutes, as_left_state, locked_out)
     VALUES ($1, $2, $3, $4, $5, $6, $7, $8, $9, $10, $11) RETURNING id`,
    {
      bind: [v.pressId, v.technicianId, firstStatus, v.fault ?? 'Test fault', v.startedAt, firstStatus === 'in_progress' ? null : (v.closedAt ?? null), v.cause ?? null, v.actions ?? null, v.labourMinutes ?? null, asLeft, lockedOut],
      type: QueryTypes.SELECT,
    },
  );
  const id = row!.id;
  if (finalStatus === 'cancelled') {
    await sequelize.query(`UPDATE visits SET status = 'cancelled', cancelled_at = now(), cancel_reason = 'Made up for tests', cancelled_by = $1 WHERE id = $2`, { bind: [v.technicianId, id] });
    return id;
  }
  if (firstStatus !== finalStatus) {
    for (const [i, verdict] of (v.verdicts ?? []).entries()) {
      const circuit = (['rotor', 'stator_1', 'stator_2'] as const)[i % 3];
      const position = i < 3 ? 'control_end' : 'sensor_end';
      await sequelize.query(
        `INSERT INTO readings (id, visit_id, step_id, quantity, circuit, position, entry, value_si, verdict, reason, judgement, created_by)
         VALUES (gen_random_uuid(), $1, 'test-step', 'resistance', $2, $3, '1', 1, $4, 'test', '{}'::jsonb, $5)`,
        { bind: [id, circuit, position, verdict, v.technicianId] },
      );
    }
    const path: VisitStatus[] = finalStatus === 'in_progress' ? [] : finalStatus === 'closed' ? ['closed'] : ['closed', finalStatus];
    for (const status of path) {
      await sequelize.query(`UPDATE visits SET status = $1, closed_at = $2 WHERE id = $3`, { bind: [status, v.closedAt ?? null, id] });
    }
  }
  return id;
}
