import type { Procedure, ReadingSpec, Step } from '../schemas/procedure';
import type { Circuit, Position } from '../schemas/reading';
import { CRANK_ANGLE_FINDINGS } from './crank-angle-findings';
import {
  BOARD_HANDLING,
  DE_ENERGIZED_MEASUREMENT,
  ENERGIZED_MEASUREMENT,
  FIRMWARE_READING,
  INSULATION_TEST,
  LIVE_WORK,
  LOCKOUT,
  PRESS_AT_REST,
  WORKING_AT_HEIGHT,
} from './safety-messages';

const RESISTANCE_METER =
  "Resistance (Ω), auto-range. Short the leads and press the meter's REL (zero) key first, so the lead resistance is not in the readings.";

/** Re-locks the press after the energized test: every hands-on step after it needs the press dead again. */
const relockGate = (id: string, next: string): Step => ({
  id,
  kind: 'safety_gate',
  gate: 'lockout',
  title: 'Lock out again after the energized test',
  instructions: "Switch off control power and re-apply your lock and tag under the plant's lockout procedure before any hands-on work.",
  safety: LOCKOUT,
  confirmations: [
    "Control power is off and my own lock and tag are back on under the plant's lockout procedure.",
    'I proved my tester on a known live source, found the control circuits dead, and proved the tester again.',
  ],
  outcomes: [{ value: 'confirmed', label: 'Locked out again and verified dead', next }],
});

/** Conductor-to-shield and conductor-to-ground, with the cable free at both ends. */
const cableInsulationCheck = (id: string, ifSound: string): Step => ({
  id,
  kind: 'check',
  title: 'Cable shield and insulation (cable disconnected at both ends)',
  instructions:
    'Disconnect the sensor cable at both ends, at the control and at the sensor. Measure from each conductor to the ' +
    'shield and to ground (an ohmmeter on its highest range, or an insulation tester only with both ends disconnected), ' +
    "and check that the shield is continuous and terminated only where the control maker's manual shows. Are the " +
    'insulation and the shield sound?',
  hazards: ['insulation_test', 'working_at_height'],
  safety: INSULATION_TEST,
  cautions: [WORKING_AT_HEIGHT],
  outcomes: [
    {
      value: 'yes',
      label: 'Insulation and shield sound',
      next: ifSound,
      evidence: [{ cause: 'cable', weight: -1, because: "The cable's insulation and shield are sound." }],
    },
    {
      value: 'no',
      label: 'Leakage, or shield open or wrongly terminated',
      next: 'finding-cable',
      evidence: [{ cause: 'cable', weight: 2, because: "The cable's insulation or shield is faulty." }],
    },
  ],
});

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
    title: 'Compare firmware of the control pair',
    instructions:
      'With the control still powered, read the firmware versions of the press control and its monitoring unit (or ' +
      'whatever pair of units the control has) from the operator display or diagnostic screens, with the enclosure ' +
      'doors closed. Type them exactly as shown; Crankwise checks the pairing against the compatibility rules.',
    hazards: ['energized_work'],
    safety: FIRMWARE_READING,
    inputs: [
      { key: 'press_control_version', label: 'Press control firmware', type: 'version', required: true },
      { key: 'monitor_module_version', label: 'Monitoring unit firmware', type: 'version', required: true },
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
        next: 'firmware-unknown',
        evidence: [{ cause: 'firmware', weight: 1, because: 'No compatibility rule covers this pairing of firmware versions.' }],
      },
      { value: 'incompatible', label: 'Incompatible pairing', next: 'finding-firmware' },
    ],
  },
  {
    id: 'firmware-unknown',
    kind: 'check',
    title: 'Firmware pairing not covered: decide before going on',
    instructions:
      'No compatibility rule covers these two versions. Stop here and ask the service manager (or the control maker) ' +
      'whether this pairing is approved for this control. Record who decided. Has the pairing been approved?',
    inputs: [{ key: 'decided_by', label: 'Who approved it, and how (name, phone or e-mail)', type: 'text', required: false }],
    outcomes: [
      { value: 'yes', label: 'Approved: go on', next: 'lockout' },
      { value: 'no', label: 'Not approved, or no answer yet', next: 'finding-firmware-undecided' },
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
    title: 'Role setting of the monitoring unit',
    instructions:
      'Where the monitoring unit works together with the press control, it has a role setting, by jumper, switch or ' +
      "parameter, per the control maker's manual, that must match how the pair is wired. Find it where the manual " +
      'says; if a board must come out to reach it, note its cable positions first and handle it by its edges with a ' +
      "grounded wrist strap. Is the role set as the maker's manual requires for this control?",
    hazards: ['board_handling'],
    safety: BOARD_HANDLING,
    inputs: [{ key: 'jumper_photo', label: 'Photo of the role setting', type: 'photo', required: false }],
    outcomes: [
      {
        value: 'yes',
        label: 'Set as the manual requires',
        next: 'connector-coupling',
        evidence: [{ cause: 'configuration', weight: -2, because: "The role setting matches the control maker's manual." }],
      },
      { value: 'no', label: 'Not as the manual requires', next: 'finding-jumper' },
    ],
  },
  {
    id: 'connector-coupling',
    kind: 'inspect',
    title: 'Circular connector of the sensor cable',
    instructions:
      'Check the circular connector at both ends of the sensor cable. The coupling ring must be screwed fully home by ' +
      'hand, the connector seated straight, and no pin bent, pushed back or corroded.',
    hazards: ['working_at_height'],
    safety: WORKING_AT_HEIGHT,
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
    hazards: ['working_at_height'],
    safety: WORKING_AT_HEIGHT,
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
    meterSetting: RESISTANCE_METER,
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
    meterSetting: RESISTANCE_METER,
    safety: DE_ENERGIZED_MEASUREMENT,
    hazards: ['working_at_height'],
    cautions: [WORKING_AT_HEIGHT],
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
      'Reconnect the sensor cable at both ends and tighten the coupling rings. Restore control power only, under the ' +
      "plant's lockout procedure: the main drive motor stays off and locked out, the flywheel at rest and the clutch " +
      'disengaged.',
    hazards: ['energized_work'],
    safety: LIVE_WORK,
    confirmations: [
      'The cable is reconnected at both ends and everyone is clear of the press.',
      "I am qualified for energized work on this equipment and wear the PPE the labels and the plant's program require.",
      'My meter and leads are rated CAT III or higher for the voltage present.',
      'I proved the meter on a known live source and will prove it again after measuring.',
      "Only control power is restored, under the plant's lockout procedure; the main drive motor stays off and locked out, the flywheel is at rest and the clutch disengaged.",
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
      'they are judged together by their vector magnitude, and with the excitation by their transformation ratio. If ' +
      "your meter is not true-RMS over the sensor's excitation frequency, say so: the step is then judged by the ratio, " +
      'which both readings from one meter keep honest.',
    meterSetting: "True-RMS AC volts (V~) with an AC bandwidth that covers the sensor's excitation frequency; auto-range. Not DC.",
    safety: ENERGIZED_MEASUREMENT,
    hazards: ['energized_work'],
    inputs: [
      {
        key: 'meter_covers_frequency',
        label: "My meter is true-RMS and its AC-volts bandwidth covers the sensor's excitation frequency",
        type: 'yes_no',
        required: true,
      },
    ],
    readings: [
      { key: 'excitation', label: 'Excitation R1–R2', quantity: 'ac_voltage', circuit: 'rotor', position: 'control_end', band: { kind: 'excitation' } },
      { key: 'sine-output', label: 'Sine stator S1–S3', quantity: 'ac_voltage', circuit: 'stator_1', position: 'control_end', band: { kind: 'stator_output' } },
      { key: 'cosine-output', label: 'Cosine stator S2–S4', quantity: 'ac_voltage', circuit: 'stator_2', position: 'control_end', band: { kind: 'stator_output' } },
    ],
    outcomes: [
      { value: 'pass', label: 'Voltages in range', next: 'relock-after-live' },
      { value: 'excitation_out_of_range', label: "Excitation out of range (the board's drive)", next: 'finding-board' },
      { value: 'output_low', label: 'Excitation in range, output low', next: 'relock-output-low' },
      { value: 'output_high', label: 'Excitation in range, output high', next: 'finding-board' },
    ],
  },
  relockGate('relock-after-live', 'sensor-drive'),
  {
    id: 'sensor-drive',
    kind: 'inspect',
    title: 'Mechanical drive of the sensor',
    instructions:
      'A drive that slips gives crank-angle faults while every electrical reading is right. At the sensor, check the ' +
      'coupling between crankshaft and sensor shaft, or the chain or belt and its sprockets: keys and set screws tight, ' +
      'no slip marks on the shafts, chain tension right, and no backlash when you try to turn the sensor shaft by hand ' +
      'against the crankshaft (which stays still: the press is locked out).',
    hazards: ['working_at_height'],
    safety: WORKING_AT_HEIGHT,
    photoPrompt: 'The coupling, or the chain and sprockets, with the set screws and any slip marks visible.',
    outcomes: [
      {
        value: 'sound',
        label: 'Tight, no slip, no backlash',
        next: 'cable-insulation',
        evidence: [{ cause: 'sensor', weight: -1, because: "The sensor's mechanical drive is tight, with no slip or backlash." }],
      },
      { value: 'slipping_or_loose', label: 'Loose, slipping or with backlash', next: 'finding-drive' },
    ],
  },
  cableInsulationCheck('cable-insulation', 'finding-none-found'),
  relockGate('relock-output-low', 'cable-insulation-output'),
  cableInsulationCheck('cable-insulation-output', 'finding-sensor-output'),
  ...CRANK_ANGLE_FINDINGS,
];

/** The first procedure, in our own words. Seeded into the procedures table; visits pin its version. */
export const CRANK_ANGLE_PROCEDURE: Procedure = {
  key: 'crank-angle-sensor-circuit',
  version: 2,
  title: 'Crank-angle sensor circuit fault',
  definition: { formatVersion: 1, start: 'press-at-rest', steps: STEPS },
};
