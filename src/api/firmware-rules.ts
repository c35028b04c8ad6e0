import type { FirmwareRuleSetRecord, FirmwareRuleSets, FirmwareRulesDraftInput } from '@shared/schemas/admin-reference';
import { versionedRecordsApi } from './versioned-records';

/** The firmware compatibility rules: one family, so a draft needs nothing. */
export const firmwareRulesApi = versionedRecordsApi<FirmwareRuleSets, FirmwareRuleSetRecord, void, FirmwareRulesDraftInput>('firmware-rules', () => ({ path: '/drafts' }));
export const firmwareRuleKeys = firmwareRulesApi.keys;
