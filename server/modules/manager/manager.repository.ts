import { QueryTypes } from 'sequelize';
import type { AuditTrailEntry } from '../../../shared/schemas/manager-figures';
import type { TechnicianOption } from '../../../shared/schemas/visit-table';
import { Visit } from '../visits/visits.model';
import { BoundParams } from './bound-params';

const db = () => Visit.sequelize!;

/** Technicians, and anyone else who has worked a visit (a manager may work one too), for the filter. */
export async function findTechnicianOptions(): Promise<TechnicianOption[]> {
  return db().query<TechnicianOption>(
    `SELECT u.id, u.name, u.active FROM users u
     WHERE u.role = 'technician' OR EXISTS (SELECT 1 FROM visits v WHERE v.technician_id = u.id)
     ORDER BY u.active DESC, u.name, u.id`,
    { type: QueryTypes.SELECT },
  );
}

export async function findAuditTrail(visitId: number): Promise<AuditTrailEntry[]> {
  const p = new BoundParams();
  const rows = await db().query<{ id: string; action: string; detail: Record<string, unknown>; created_at: Date; actor_id: number | null; actor_name: string | null }>(
    `SELECT a.id, a.action, a.detail, a.created_at, u.id AS actor_id, u.name AS actor_name
     FROM audit_events a LEFT JOIN users u ON u.id = a.actor_id
     WHERE a.visit_id = ${p.add(visitId)}
     ORDER BY a.created_at, a.id`,
    { bind: p.values, type: QueryTypes.SELECT },
  );
  return rows.map((r) => ({
    id: Number(r.id),
    action: r.action,
    actor: r.actor_id === null ? null : { id: r.actor_id, name: r.actor_name ?? '' },
    detail: r.detail,
    createdAt: r.created_at.toISOString(),
  }));
}
