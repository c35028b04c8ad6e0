import { CRANK_ANGLE_PROCEDURE } from '../data/crank-angle-procedure';
import { judgeMeasurements } from './judge-measurements';
import { evidenceFromPath, rankLikelyCauses } from './likely-cause';
import { evidenceFromReadings } from './reading-evidence';
import { OLDER_GENERATION } from './testing/trade-fact-band-sets';
import { traverseProcedure } from './traverse-procedure';
import type { CauseEvidence } from '../schemas/procedure';
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

  // Common practice, no published source: with the drive (excitation) in range, a low output is the
  // sensor (shorted turns barely change DC resistance) or its cable, not the board.
  it('points to the sensor or cable, not the board, when the excitation is in range and the output low', () => {
    const ranking = rankLikelyCauses(evidenceFromReadings(judgedAll([...windings('control_end', '89', '70', '70'), ...volts('4.2', '0.8', '1.0')])));
    expect(ranking.ranked.slice(0, 2).map((c) => c.cause).sort()).toEqual(['cable', 'sensor']);
    expect(ranking.ranked.map((c) => c.cause)).not.toContain('board');
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

const ev = (cause: CauseEvidence['cause'], weight: number, because = `${cause} ${weight}`): CauseEvidence => ({ cause, weight, because });

describe('rankLikelyCauses — order, ties and ruled-out causes', () => {
  it('sorts by total score, most likely first, whatever order the evidence came in', () => {
    const ranking = rankLikelyCauses([ev('cable', 1), ev('sensor', 3)]);
    expect(ranking.ranked.map((c) => [c.cause, c.score])).toEqual([['sensor', 3], ['cable', 1]]);
  });

  it('breaks ties by the category order (configuration before board)', () => {
    expect(rankLikelyCauses([ev('board', 1), ev('configuration', 1)]).ranked.map((c) => c.cause)).toEqual(['configuration', 'board']);
    expect(rankLikelyCauses([ev('cable', 2), ev('wiring', 2), ev('firmware', 2)]).ranked.map((c) => c.cause)).toEqual(['wiring', 'firmware', 'cable']);
  });

  it('sums evidence per cause with all its reasons; causes at 0 are neither ranked nor ruled out, negatives are ruled out', () => {
    const ranking = rankLikelyCauses([ev('sensor', -2, 'windings read right'), ev('wiring', 1, 'a'), ev('wiring', -1, 'b'), ev('board', 3, 'low volts'), ev('board', -1, 'c')]);
    expect(ranking.ranked).toEqual([{ cause: 'board', score: 2, reasons: ['low volts', 'c'] }]);
    expect(ranking.ruledOut).toEqual([{ cause: 'sensor', score: -2, reasons: ['windings read right'] }]);
  });

  it('lists ruled-out causes most strongly ruled out last (sorted like the rest)', () => {
    expect(rankLikelyCauses([ev('cable', -3), ev('sensor', -1)]).ruledOut.map((c) => c.cause)).toEqual(['sensor', 'cable']);
  });

  it('only negative evidence: none_found is the ranked answer', () => {
    const ranking = rankLikelyCauses([ev('firmware', -2)]);
    expect(ranking.ranked.map((c) => c.cause)).toEqual(['none_found']);
    expect(ranking.ruledOut.map((c) => c.cause)).toEqual(['firmware']);
  });
});

describe('evidenceFromPath — the outcome chosen, and the finding', () => {
  const definition = CRANK_ANGLE_PROCEDURE.definition;
  it('uses the evidence of the outcome the technician chose, not of another outcome of the step', () => {
    expect(evidenceFromPath(definition, [{ stepId: 'firmware-versions', kind: 'firmware', outcome: 'unknown' }]).map((e) => [e.cause, e.weight])).toEqual([['firmware', 1]]);
    expect(evidenceFromPath(definition, [{ stepId: 'firmware-versions', kind: 'firmware', outcome: 'compatible' }]).map((e) => [e.cause, e.weight])).toEqual([['firmware', -2]]);
  });

  it('adds weight 3 for a finding reached, naming it; an id that is not a finding adds nothing; unknown steps are skipped', () => {
    const findingStep = definition.steps.find((s) => s.kind === 'finding')!;
    expect(evidenceFromPath(definition, [], findingStep.id)).toEqual([{ cause: (findingStep as { cause: CauseEvidence['cause'] }).cause, weight: 3, because: `Finding reached: ${findingStep.title}.` }]);
    expect(evidenceFromPath(definition, [], 'firmware-versions')).toEqual([]);
    expect(evidenceFromPath(definition, [{ stepId: 'no-such-step', kind: 'check', outcome: 'yes' }, { stepId: findingStep.id, kind: 'finding', outcome: 'x' }])).toEqual([]);
  });
});

// Trade reasoning (common practice, no published source), as in the first block; older generation 89 Ω / 70 Ω, 4–4.5 V, 2–2.5 V.
describe('evidenceFromReadings — each trade rule on its own', () => {
  const leads = (because: string) => expect.stringContaining(because);

  it('a winding failing at the sensor end (both ends OL) points at the sensor with weight 3, naming its leads', () => {
    const evidence = evidenceFromReadings(judgedAll([...windings('control_end', '89', 'OL', '70'), ...windings('sensor_end', '89', 'OL', '70')]));
    expect(evidence).toEqual([{ cause: 'sensor', weight: 3, because: leads('S1–S3 fails at the sensor end') }]);
  });

  it('a winding failing at the control end but passing at the sensor end points at the cable, that circuit only', () => {
    const evidence = evidenceFromReadings(judgedAll([...windings('control_end', '89', 'OL', '70'), ...windings('sensor_end', '89', '70', '70')]));
    expect(evidence).toEqual([{ cause: 'cable', weight: 3, because: leads('S1–S3 fails at the control end but passes at the sensor end') }]);
  });

  it('a control-end failure not yet measured at the sensor end: sensor 1 and cable 1', () => {
    const evidence = evidenceFromReadings(judgedAll(windings('control_end', '89', '70', '0.5')));
    expect(evidence.map((e) => [e.cause, e.weight])).toEqual([['sensor', 1], ['cable', 1]]);
    expect(evidence.every((e) => e.because.includes('S2–S4'))).toBe(true);
  });

  it('near-edge windings count as reading right (sensor −2, cable −2)', () => {
    // 100 Ω is 12.4 % above 89 Ω: near the edge (±10 % in band, ±20 % near edge in the test bands).
    const evidence = evidenceFromReadings(judgedAll(windings('control_end', '100', '70', '70')));
    expect(evidence).toEqual([
      { cause: 'sensor', weight: -2, because: leads('windings read right') },
      { cause: 'cable', weight: -2, because: leads('windings read right') },
    ]);
  });

  it('an unreadable sensor-end entry is not counted as a failure there', () => {
    const evidence = evidenceFromReadings(judgedAll([...windings('control_end', '89', 'OL', '70'), ...windings('sensor_end', '89', '7O', '70')]));
    expect(evidence.map((e) => [e.cause, e.weight])).toEqual([['sensor', 1], ['cable', 1]]);
  });

  // The excitation comes from the board's drive; until the windings are known to read right a shorted
  // rotor winding loading the drive stays possible, so the board gets 2, not 3.
  it('excitation low without any winding readings: board 2 only (the windings do not all pass yet)', () => {
    const evidence = evidenceFromReadings(judgedAll(volts('2.9', '0.8', '1.1')));
    expect(evidence).toEqual([{ cause: 'board', weight: 2, because: leads('excitation reads low') }]);
  });

  it('windings right and voltages low: board 3', () => {
    const evidence = evidenceFromReadings(judgedAll([...windings('control_end', '89', '70', '70'), ...volts('2.9', '0.8', '1.1')]));
    expect(evidence.find((e) => e.cause === 'board')).toEqual({ cause: 'board', weight: 3, because: leads('processor board') });
  });

  it('an excitation above its range points at the board (the excitation comes from it): 3 with the windings right, 2 without', () => {
    const evidence = evidenceFromReadings(judgedAll([...windings('control_end', '89', '70', '70'), ...volts('6.0', '1.3', '1.7')]));
    expect(evidence.find((e) => e.cause === 'board')).toEqual({ cause: 'board', weight: 3, because: leads('excitation reads high') });
    const ol = evidenceFromReadings(judgedAll(volts('OL', '1.3', '1.7')));
    expect(ol.map((e) => [e.cause, e.weight])).toEqual([['board', 2]]);
  });

  it('excitation in range, output low: sensor 3 and cable 3 (more than the windings\' −2), board −1', () => {
    const evidence = evidenceFromReadings(judgedAll(volts('4.2', '0.8', '1.0')));
    expect(evidence.map((e) => [e.cause, e.weight])).toEqual([['sensor', 3], ['cable', 3], ['board', -1]]);
  });

  // The procedure sends "voltages in range" on to the drive and cable checks, not to the board.
  it('excitation and output in range count against the board (board −2, nothing else)', () => {
    expect(evidenceFromReadings(judgedAll(volts('4.2', '1.3', '1.7')))).toEqual([{ cause: 'board', weight: -2, because: leads('Excitation and output read right') }]);
  });
});

describe('evidenceFromPath — outcomes without evidence', () => {
  const definition = {
    formatVersion: 1 as const,
    start: 'look',
    steps: [
      { id: 'look', kind: 'check' as const, title: 'Look', instructions: 'x', outcomes: [
        { value: 'yes', label: 'y', next: 'end', evidence: [{ cause: 'cable' as const, weight: 1, because: 'Chafed.' }] },
        { value: 'no', label: 'n', next: 'end' },
      ] },
      { id: 'end', kind: 'finding' as const, title: 'End', instructions: 'x', cause: 'none_found' as const, conclusion: 'c', recommendedAction: 'a', escalate: false },
    ],
  };

  it('an outcome that carries no evidence adds none, and an outcome the step does not have adds none', () => {
    expect(evidenceFromPath(definition, [{ stepId: 'look', kind: 'check', outcome: 'no' }])).toEqual([]);
    expect(evidenceFromPath(definition, [{ stepId: 'look', kind: 'check', outcome: 'maybe' }])).toEqual([]);
    expect(evidenceFromPath(definition, [{ stepId: 'look', kind: 'check', outcome: 'yes' }])).toEqual([{ cause: 'cable', weight: 1, because: 'Chafed.' }]);
  });
});
