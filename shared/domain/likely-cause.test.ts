import { CRANK_ANGLE_PROCEDURE } from '../data/crank-angle-procedure';
import { judgeMeasurements } from './judge-measurements';
import { evidenceFromPath, rankLikelyCauses } from './likely-cause';
import { evidenceFromReadings } from './reading-evidence';
import { OLDER_GENERATION } from './testing/trade-fact-band-sets';
import { traverseProcedure } from './traverse-procedure';
import type { Position, ReadingInput } from '../schemas/reading';

const windings = (position: Position, rotor: string, s1: string, s2: string): ReadingInput[] => [
  { quantity: 'resistance', circuit: 'rotor', position, entered: rotor },
  { quantity: 'resistance', circuit: 'stator_1', position, entered: s1 },
  { quantity: 'resistance', circuit: 'stator_2', position, entered: s2 },
];
const volts = (e: string, s1: string, s2: string): ReadingInput[] => [
  { quantity: 'ac_voltage', circuit: 'rotor', position: 'control_end', entered: e },
  { quantity: 'ac_voltage', circuit: 'stator_1', position: 'control_end', entered: s1 },
  { quantity: 'ac_voltage', circuit: 'stator_2', position: 'control_end', entered: s2 },
];
const judgedAll = (readings: ReadingInput[]) => judgeMeasurements(readings, OLDER_GENERATION).results;

// Trade reasoning (common practice, no published source): windings that read right while the
// voltages read low point to the processor board, not the sensor or cable; readings far off in the
// resistance test point to the sensor or its cable. Bands: older generation 89 Ω / 70 Ω, 4–4.5 V, 2–2.5 V.
describe('likely cause from readings', () => {
  it('ranks the board first when the windings read right and the voltages read low, and rules out sensor and cable', () => {
    const ranking = rankLikelyCauses(evidenceFromReadings(judgedAll([...windings('control_end', '89', '70', '70'), ...volts('2.9', '0.8', '1.1')])));
    expect(ranking.ranked[0]!.cause).toBe('board');
    expect(ranking.ranked[0]!.reasons.join(' ')).toContain('processor board');
    expect(ranking.ruledOut.map((c) => c.cause).sort()).toEqual(['cable', 'sensor']);
  });

  it('points to the sensor or its cable when a winding is far off in the resistance test', () => {
    const ranking = rankLikelyCauses(evidenceFromReadings(judgedAll(windings('control_end', '89', 'OL', '70'))));
    expect(ranking.ranked.map((c) => c.cause).sort()).toEqual(['cable', 'sensor']);
  });

  it('tells cable from sensor once the sensor end is measured', () => {
    const cable = rankLikelyCauses(evidenceFromReadings(judgedAll([...windings('control_end', '89', 'OL', '70'), ...windings('sensor_end', '89', '70', '70')])));
    expect(cable.ranked[0]!.cause).toBe('cable');
    const sensor = rankLikelyCauses(evidenceFromReadings(judgedAll([...windings('control_end', '89', 'OL', '70'), ...windings('sensor_end', '89', 'OL', '70')])));
    expect(sensor.ranked[0]!.cause).toBe('sensor');
  });

  it('says none_found when nothing points anywhere', () => {
    expect(rankLikelyCauses([]).ranked).toEqual([{ cause: 'none_found', score: 0, reasons: ['Nothing so far points to a cause.'] }]);
  });
});

describe('likely cause from the path', () => {
  it('counts the outcomes chosen and the finding reached', () => {
    const answers = [
      { stepId: 'press-at-rest', outcome: 'confirmed' },
      { stepId: 'firmware-versions', outcome: 'compatible' },
      { stepId: 'lockout', outcome: 'confirmed' },
      { stepId: 'identify-generation', outcome: 'nameplate' },
      { stepId: 'monitor-jumper', outcome: 'no' },
    ];
    const t = traverseProcedure(CRANK_ANGLE_PROCEDURE.definition, answers);
    const ranking = rankLikelyCauses(evidenceFromPath(CRANK_ANGLE_PROCEDURE.definition, t.path, t.findings[0]?.id));
    expect(ranking.ranked[0]!.cause).toBe('configuration');
    expect(ranking.ruledOut.map((c) => c.cause)).toContain('firmware');
  });
});
