import type { Cable } from '@shared/schemas/reading';
import type { ReadingRecord } from '@shared/schemas/visit-detail';

/** Winding temperature and cable, shared by every resistance reading of one step. */
export interface ReadingConditions {
  windingTemperatureC?: number;
  cable?: Cable;
}

export interface ConditionsDraft {
  temperature: string;
  awg: string;
  length: string;
  lengthUnit: Cable['lengthUnit'];
  lengthIs: Cable['lengthIs'];
}

export type ConditionsErrors = Partial<Record<'temperature' | 'awg' | 'length', string>>;

export const EMPTY_CONDITIONS: ConditionsDraft = { temperature: '', awg: '', length: '', lengthUnit: 'ft', lengthIs: 'one_way' };

export function draftFromReading(r: ReadingRecord | undefined): ConditionsDraft {
  if (!r) return EMPTY_CONDITIONS;
  return {
    temperature: r.windingTemperatureC === null ? '' : String(r.windingTemperatureC),
    awg: r.cable ? String(r.cable.awg) : '',
    length: r.cable ? String(r.cable.length) : '',
    lengthUnit: r.cable?.lengthUnit ?? 'ft',
    lengthIs: r.cable?.lengthIs ?? 'one_way',
  };
}

const number = (text: string) => (text.trim() === '' ? undefined : Number(text.trim()));

/** Turns the typed temperature and cable into the engine's conditions, or says what to fix. */
export function parseConditions(draft: ConditionsDraft): { conditions: ReadingConditions; errors: ConditionsErrors } {
  const errors: ConditionsErrors = {};
  const conditions: ReadingConditions = {};
  const t = number(draft.temperature);
  if (t !== undefined) {
    if (!Number.isFinite(t) || t < -40 || t > 150) errors.temperature = 'Type the winding temperature in °C, between -40 and 150.';
    else conditions.windingTemperatureC = t;
  }
  const awg = number(draft.awg);
  const length = number(draft.length);
  if (awg !== undefined || length !== undefined) {
    if (awg === undefined || !Number.isInteger(awg) || awg < 0 || awg > 40) errors.awg = 'Type the conductor gauge as a whole AWG number, 0 to 40 (e.g. 22).';
    if (length === undefined || !Number.isFinite(length) || length <= 0 || length > 10_000) errors.length = 'Type the cable length, more than 0 and at most 10,000.';
    if (!errors.awg && !errors.length) {
      conditions.cable = { awg: awg!, length: length!, lengthUnit: draft.lengthUnit, lengthIs: draft.lengthIs };
    }
  }
  return { conditions, errors };
}

/** A stable text for comparing the conditions a reading was saved with against the ones typed now. */
export function conditionsKey(c: ReadingConditions): string {
  const cable = c.cable ? `${c.cable.awg}/${c.cable.length}${c.cable.lengthUnit}/${c.cable.lengthIs}` : '-';
  return `${c.windingTemperatureC ?? '-'}|${cable}`;
}

export const storedConditions = (r: ReadingRecord): ReadingConditions => ({
  ...(r.windingTemperatureC !== null ? { windingTemperatureC: r.windingTemperatureC } : {}),
  ...(r.cable ? { cable: { awg: r.cable.awg, length: r.cable.length, lengthUnit: r.cable.lengthUnit, lengthIs: r.cable.lengthIs } } : {}),
});
