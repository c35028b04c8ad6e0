import type { Procedure, ReadingSpec, Step } from '../schemas/procedure';
import type { Circuit, Position } from '../schemas/reading';
import { CRANK_ANGLE_FINDINGS } from './crank-angle-findings';
import {
  DE_ENERGIZED_MEASUREMENT,
  ENERGIZED_MEASUREMENT,
  LIVE_WORK,
  LOCKOUT,
  PRESS_AT_REST,
} from './safety-messages';

const WINDINGS: Array<[Circuit, string]> = [
  ['rotor', 'Rotor R1–R2'],
  ['stator_1', 'Sine stator S1–S3'],
  ['stator_2', 'Cosine stator S2–S4'],
];

const windingReadings = (position: Position): ReadingSpec[] =>
  WINDINGS.map(([circuit, label]) => ({
    key: `${circuit}-${position}`,
    label,
    quantity: 'resistance',
    circuit,
    position,
    band: { kind: 'winding', circuit },
  }));

const STEPS: Step[] = [
  {
    id: 'press-at-rest',
    kind: 'safety_gate',
    gate: 'press_at_rest',
    title: 'Bring the press to rest',
    instructions: 'Stop the press before anything else and record the fault exactly as the control displays it.',
    safety: PRESS_AT_REST,
    confirmations: [
      'The flywheel has stopped turning.',
      'The clutch is disengaged.',
      'The slide is at rest; if anyone will work in the die area, die safety blocks are in place.',
      'The fault as displayed has been recorded (photo of the display).',
    ],
    outcomes: [{ value: 'confirmed', label: 'Press at rest', next: 'firmware-versions' }],
  },
  {
    id: 'firmware-versions',
    kind: 'firmware',
    title: 'Compare firmware of the two units',
    instructions:
      'With the control still powered, read the firmware version of the press control and of the monitor module from ' +
      'their displays or diagnostic screens. Type them exactly as shown; Crankwise checks the pairing against the ' +
      'compatibility rules.',
    inputs: [
      { key: 'press_control_version', label: 'Press control firmware', type: 'version', required: true },
      { key: 'monitor_module_version', label: 'Monitor module firmware', type: 'version', required: true },
    ],
    outcomes: [
      {
        value: 'compatible',
        label: 'Compatible pairing',
        next: 'lockout',
        evidence: [{ cause: 'firmware', weight: -2, because: 'The firmware versions are a compatible pairing.' }],
      },
      {
        value: 'unknown',
        label: 'No rule covers this pairing',
        next: 'lockout',
        evidence: [{ cause: 'firmware', weight: 1, because: 'No compatibility rule covers this pairing of firmware versions.' }],
      },
      { value: 'incompatible', label: 'Incompatible pairing', next: 'finding-firmware' },
    ],
  },
  {
    id: 'lockout',
    kind: 'safety_gate',
    gate: 'lockout',
    title: 'Lock out the press',
    instructions: 'Everything up to the energized test is done with the press locked out.',
    safety: LOCKOUT,
    confirmations: [
      "The press is locked and tagged out under the plant's lockout procedure, with my own lock.",
      'Stored energy is relieved or blocked: flywheel stopped, counterbalance and slide secured.',
      'I proved my tester on a known live source, found the control circuits dead, and proved the tester again.',
    ],
    outcomes: [{ value: 'confirmed', label: 'Locked out and verified dead', next: 'identify-generation' }],
  },
  {
    id: 'identify-generation',
    kind: 'choice',
    title: 'Identify the sensor generation',
    instructions:
      'Find the nameplate on the crank-angle sensor housing. If it is legible, choose the generation it names. If the ' +
      'plate is missing or unreadable, Crankwise suggests the generation from the resistance readings later.',
    inputs: [{ key: 'sensor_generation', label: 'Sensor generation (from the nameplate)', type: 'sensor_generation', required: false }],
    outcomes: [
      { value: 'nameplate', label: 'Read from the nameplate', next: 'monitor-jumper' },
      { value: 'infer', label: 'Nameplate unreadable: infer from readings', next: 'sensor-markings' },
    ],
  },
  {
    id: 'sensor-markings',
    kind: 'inspect',
    title: 'Record the sensor as found',
    instructions:
      'Photograph the housing, any label remnants and the connector, and note anything that may tell the generation ' +
      '(housing shape, mounting, pin count). Confirm the suggested generation before the readings are judged.',
    photoPrompt: 'Sensor housing, label area and connector.',
    outcomes: [{ value: 'recorded', label: 'Photos taken', next: 'monitor-jumper' }],
  },
  {
    id: 'monitor-jumper',
    kind: 'check',
    title: 'Bus-role jumper on the monitor module',
    instructions:
      'When the monitor module runs under the press control, its bus-role jumper must be in the follower position. ' +
      'The jumper sits under the board mounted above the module: to see or move it, remove that board (note its cable ' +
      'positions first; wear a grounded wrist strap and hold boards by their edges). Is the jumper in the follower position?',
    inputs: [{ key: 'jumper_photo', label: 'Photo of the jumper', type: 'photo', required: false }],
    outcomes: [
      {
        value: 'yes',
        label: 'Follower position',
        next: 'connector-coupling',
        evidence: [{ cause: 'configuration', weight: -2, because: 'The bus-role jumper is in the follower position.' }],
      },
      { value: 'no', label: 'Not in the follower position', next: 'finding-jumper' },
    ],
  },
  {
    id: 'connector-coupling',
    kind: 'inspect',
    title: 'Circular connector of the sensor cable',
    instructions:
      'Check the circular connector at both ends of the sensor cable. The coupling ring must be screwed fully home by ' +
      'hand, the connector seated straight, and no pin bent, pushed back or corroded.',
    photoPrompt: 'Both ends of the connector with the coupling ring and the pins visible.',
    outcomes: [
      {
        value: 'secure',
        label: 'Fully coupled, pins sound',
        next: 'wiring-conductors',
        evidence: [{ cause: 'wiring', weight: -1, because: 'The circular connector is fully coupled with sound pins.' }],
      },
      { value: 'loose_or_damaged', label: 'Ring loose or pins damaged', next: 'finding-connector' },
    ],
  },
  {
    id: 'wiring-conductors',
    kind: 'inspect',
    title: 'Conductors and terminations',
    instructions:
      'Follow the cable and open the terminations you can reach. Look for a broken or frayed conductor (often where the ' +
      'cable flexes or leaves a strain relief) and for a terminal screw clamped on insulation instead of bare conductor. ' +
      'Tug each conductor gently at its terminal.',
    photoPrompt: 'Each termination, and any damaged length of cable.',
    outcomes: [
      {
        value: 'sound',
        label: 'All sound',
        next: 'resistance-control-end',
        evidence: [{ cause: 'wiring', weight: -1, because: 'Conductors and terminations look sound.' }],
      },
      { value: 'broken_or_frayed', label: 'Broken or frayed conductor', next: 'finding-conductor' },
      { value: 'clamped_on_insulation', label: 'Screw clamped on insulation', next: 'finding-clamp' },
    ],
  },
  {
    id: 'resistance-control-end',
    kind: 'measure',
    title: 'Winding resistance at the control end',
    instructions:
      'Unplug the sensor cable at the control and measure across the pins of the cable plug: rotor R1–R2, sine stator ' +
      'S1–S3, cosine stator S2–S4. Give the cable gauge and length so the cable can be subtracted, and the winding ' +
      'temperature if the press was running (a warm winding reads higher).',
    meterSetting: 'Resistance (Ω), auto-range; touch the leads together and note the lead resistance first.',
    safety: DE_ENERGIZED_MEASUREMENT,
    readings: windingReadings('control_end'),
    suggestsGeneration: true,
    outcomes: [
      { value: 'pass', label: 'All windings pass', next: 'reconnect-for-live' },
      { value: 'imbalance', label: 'Stators unbalanced', next: 'resistance-sensor-end' },
      { value: 'low', label: 'A winding reads low or short', next: 'resistance-sensor-end' },
      { value: 'high', label: 'A winding reads high or open', next: 'resistance-sensor-end' },
    ],
  },
  {
    id: 'resistance-sensor-end',
    kind: 'measure',
    title: 'Winding resistance at the sensor end',
    instructions:
      'Unplug the cable at the sensor and measure the same three windings at the sensor\'s own pins. This takes the ' +
      'cable out of the loop: a winding that now passes points to the cable.',
    meterSetting: 'Resistance (Ω), auto-range.',
    safety: DE_ENERGIZED_MEASUREMENT,
    readings: windingReadings('sensor_end'),
    outcomes: [
      { value: 'pass', label: 'All windings pass at the sensor', next: 'finding-cable' },
      { value: 'imbalance', label: 'Stators unbalanced at the sensor', next: 'finding-sensor' },
      { value: 'low', label: 'A winding reads low or short', next: 'finding-sensor' },
      { value: 'high', label: 'A winding reads high or open', next: 'finding-sensor' },
    ],
  },
  {
    id: 'reconnect-for-live',
    kind: 'safety_gate',
    gate: 'live_work',
    title: 'Prepare for the energized test',
    instructions:
      'Reconnect the sensor cable at both ends and tighten the coupling rings. Restore control power only under the ' +
      "plant's lockout procedure; the press stays stopped with the clutch disengaged.",
    safety: LIVE_WORK,
    confirmations: [
      'The cable is reconnected at both ends and everyone is clear of the press.',
      "I am qualified for energized work on this equipment and wear the PPE the labels and the plant's program require.",
      'My meter and leads are rated CAT III or higher for the voltage present.',
      'I proved the meter on a known live source and will prove it again after measuring.',
      "Control power is restored under the plant's lockout procedure; the press is stopped, clutch disengaged.",
    ],
    outcomes: [{ value: 'confirmed', label: 'Ready for energized work', next: 'ac-voltages' }],
  },
  {
    id: 'ac-voltages',
    kind: 'measure',
    title: 'Excitation and stator voltages (energized)',
    instructions:
      'At the control\'s sensor terminals, with the connector in place, measure the excitation across the rotor R1–R2, ' +
      'then the sine stator S1–S3 and the cosine stator S2–S4. The two stator voltages trade off as the crank turns; ' +
      'they are judged together by their vector magnitude.',
    meterSetting: 'AC volts (V~), auto-range. Not DC.',
    safety: ENERGIZED_MEASUREMENT,
    readings: [
      { key: 'excitation', label: 'Excitation R1–R2', quantity: 'ac_voltage', circuit: 'rotor', position: 'control_end', band: { kind: 'excitation' } },
      { key: 'sine-output', label: 'Sine stator S1–S3', quantity: 'ac_voltage', circuit: 'stator_1', position: 'control_end', band: { kind: 'stator_output' } },
      { key: 'cosine-output', label: 'Cosine stator S2–S4', quantity: 'ac_voltage', circuit: 'stator_2', position: 'control_end', band: { kind: 'stator_output' } },
    ],
    outcomes: [
      { value: 'pass', label: 'Voltages in range', next: 'finding-none-found' },
      { value: 'low', label: 'A voltage reads low', next: 'finding-board' },
      { value: 'high', label: 'A voltage reads high', next: 'finding-board' },
    ],
  },
  ...CRANK_ANGLE_FINDINGS,
];

/** The first procedure, in our own words. Seeded into the procedures table; visits pin its version. */
export const CRANK_ANGLE_PROCEDURE: Procedure = {
  key: 'crank-angle-sensor-circuit',
  version: 1,
  title: 'Crank-angle sensor circuit fault',
  definition: { formatVersion: 1, start: 'press-at-rest', steps: STEPS },
};
