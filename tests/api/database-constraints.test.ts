import { describe, expect, it } from 'vitest';
import { Visit } from '../../server/modules/visits/visits.model';
import { makePress, makeUser } from '../factories';
import { useTestDatabase } from '../setup/database';

const db = useTestDatabase();

async function newVisit() {
  const { press } = await makePress();
  const tech = await makeUser('technician');
  return Visit.create({ pressId: press.id, technicianId: tech.id, controlFirmwareFound: null, monitorFirmwareFound: null, startedAt: null, closedAt: null });
}

describe('constraints kept by the database itself', () => {
  it('walks a visit through the allowed statuses', async () => {
    const visit = await newVisit();
    expect(visit.status).toBe('draft');
    await visit.update({ status: 'in_progress', startedAt: new Date() });
    await visit.update({ status: 'closed', closedAt: new Date() });
    await visit.update({ status: 'returned' });
    await visit.update({ status: 'in_progress' });
    await visit.update({ status: 'closed' });
    await visit.update({ status: 'approved' });
    await visit.reload();
    expect(visit.status).toBe('approved');
  });

  it.each([
    ['draft', 'closed'],
    ['draft', 'approved'],
    ['in_progress', 'approved'],
    ['in_progress', 'returned'],
  ])('refuses a visit going from %s straight to %s', async (from, to) => {
    const visit = await newVisit();
    if (from === 'in_progress') await visit.update({ status: 'in_progress' });
    await expect(db.sequelize.query(`UPDATE visits SET status = :to, closed_at = now() WHERE id = :id`, { replacements: { to, id: visit.id } })).rejects.toThrow(
      /visit status cannot change/,
    );
  });

  it('refuses an approved visit going anywhere', async () => {
    const visit = await newVisit();
    for (const s of ['in_progress', 'closed', 'approved'] as const) await visit.update({ status: s, closedAt: new Date() });
    await expect(db.sequelize.query(`UPDATE visits SET status = 'in_progress' WHERE id = :id`, { replacements: { id: visit.id } })).rejects.toThrow(/approved to in_progress/);
  });

  it('refuses an unknown status, a zero tonnage and an upper-case e-mail', async () => {
    const visit = await newVisit();
    await expect(db.sequelize.query(`UPDATE visits SET status = 'lost' WHERE id = :id`, { replacements: { id: visit.id } })).rejects.toThrow();
    await expect(db.sequelize.query(`UPDATE presses SET tonnage = 0`)).rejects.toThrow(/check constraint/);
    await expect(db.sequelize.query(`UPDATE users SET email = 'LOUD@TEST.EXAMPLE'`)).rejects.toThrow(/check constraint/);
  });

  it('refuses to delete a customer that still has sites', async () => {
    const { customer } = await makePress();
    await expect(db.sequelize.query(`DELETE FROM customers WHERE id = :id`, { replacements: { id: customer.id } })).rejects.toThrow(/foreign key/);
  });
});
