import type { Sequelize } from 'sequelize';
import { CRANK_ANGLE_PROCEDURE } from '../../../shared/data/crank-angle-procedure';
import { DEMO_BAND_SETS } from '../../../shared/data/demo-band-sets';
import { DEMO_FIRMWARE_RULES } from '../../../shared/data/demo-firmware-rules';
import { validateProcedure } from '../../../shared/domain/validate-procedure';
import { BandSetVersion, FirmwareRuleSet, ProcedureVersion } from '../../modules/reference/reference.model';
import { initModels } from '../models';

/**
 * Seeds the first procedure and the (invented) demo band sets and firmware rules from shared/data,
 * published. Idempotent: a (key, version) that exists is left as it is.
 */
export async function seedReference(sequelize: Sequelize): Promise<{ created: number }> {
  initModels(sequelize);
  const checked = validateProcedure(CRANK_ANGLE_PROCEDURE.definition);
  if (!checked.ok) throw new Error(`The seeded procedure does not validate:\n${checked.problems.map((p) => `  ${p.message}`).join('\n')}`);
  let created = 0;
  const now = new Date();
  await sequelize.transaction(async (transaction) => {
    const p = CRANK_ANGLE_PROCEDURE;
    const [, madeProcedure] = await ProcedureVersion.findOrCreate({
      where: { key: p.key, version: p.version },
      defaults: { key: p.key, version: p.version, title: p.title, definition: p.definition, publishedAt: now, createdBy: null },
      transaction,
    });
    if (madeProcedure) created++;
    for (const b of DEMO_BAND_SETS) {
      const [, made] = await BandSetVersion.findOrCreate({
        where: { generation: b.generation, version: b.version },
        defaults: { generation: b.generation, version: b.version, label: b.values.label, bands: b.values, publishedAt: now, createdBy: null },
        transaction,
      });
      if (made) created++;
    }
    const [, madeRules] = await FirmwareRuleSet.findOrCreate({
      where: { version: 1 },
      defaults: { version: 1, rules: [...DEMO_FIRMWARE_RULES], publishedAt: now, createdBy: null },
      transaction,
    });
    if (madeRules) created++;
  });
  return { created };
}
