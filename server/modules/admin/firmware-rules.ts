import { firmwareRulesDraftSchema, type FirmwareRuleSetRecord, type FirmwareRuleSets } from '../../../shared/schemas/admin-reference';
import { AppError } from '../../lib/errors';
import { FirmwareRuleSet } from '../reference/reference.model';
import { versionInfo, type VersionedResource } from '../../lib/versioned-records/versioned-service';

const toRecord = (r: FirmwareRuleSet): FirmwareRuleSetRecord => ({ ...versionInfo(r), rules: r.rules });

/** Firmware rules: the whole table is one family; a draft starts from the current rules (or none). */
export const firmwareRules: VersionedResource<FirmwareRuleSet, FirmwareRuleSetRecord, FirmwareRuleSets, never, typeof firmwareRulesDraftSchema> = {
  model: FirmwareRuleSet,
  what: 'The firmware rule set',
  audit: 'firmware_rules',
  toRecord,
  list: {
    item: ({ rows, current, draft }) => ({
      current: current ? toRecord(current) : null,
      draft: draft ? toRecord(draft) : null,
      versions: rows.map((r) => ({ ...versionInfo(r), ruleCount: r.rules.length })),
    }),
  },
  draft: { copy: (current) => ({ rules: current?.rules ?? [] }) },
  save: { schema: firmwareRulesDraftSchema, content: ({ rules }) => ({ rules }) },
  beforePublish: (row) => {
    if (row.rules.length === 0) throw new AppError(409, 'empty_rules', 'This draft has no rules. Add at least one rule before publishing, or discard the draft.');
  },
};
