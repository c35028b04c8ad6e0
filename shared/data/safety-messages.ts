import type { SafetyMessage } from '../schemas/procedure';

/** Appended to every safety message: our guidance never overrides the plant's own rules. */
export const PLANT_RULES_FIRST = "The plant's lockout procedure, local codes and licensed practice come first.";

export const PRESS_AT_REST: SafetyMessage = {
  signalWord: 'WARNING',
  text:
    'Moving parts can crush or amputate. Before touching the press, bring it to rest: the flywheel has coasted to a ' +
    'standstill, the clutch is disengaged and the slide is at rest. Whenever work takes anyone into the die area, die ' +
    `safety blocks must be in place (OSHA 29 CFR 1910.217(d)(9)(iv)). ${PLANT_RULES_FIRST}`,
};

export const LOCKOUT: SafetyMessage = {
  signalWord: 'DANGER',
  text:
    'Hazardous voltage and stored energy. Before opening the control enclosure or unplugging the sensor, lock out and ' +
    "tag out the press under the plant's lockout procedure (OSHA 29 CFR 1910.147): shut down, isolate every energy " +
    'source, apply your own lock and tag, relieve stored energy (flywheel, counterbalance, slide weight) and verify ' +
    'that the circuits are dead with a tester proven on a known live source. Only the person who applied a lock ' +
    `removes it. ${PLANT_RULES_FIRST}`,
  covers: ['stored_energy', 'relock'],
};

export const DE_ENERGIZED_MEASUREMENT: SafetyMessage = {
  signalWord: 'CAUTION',
  text:
    'Measure resistance only with the press locked out: an ohmmeter on a live circuit gives false readings and can ' +
    `damage the meter or injure you. ${PLANT_RULES_FIRST}`,
};

export const LIVE_WORK: SafetyMessage = {
  signalWord: 'DANGER',
  text:
    'Measuring on energized circuits is energized electrical work (NFPA 70E): qualified persons only, wearing the PPE ' +
    "that the equipment's labels and the plant's program require. Use a meter and leads rated CAT III (IEC 61010-1 " +
    'with IEC 61010-2-030) or higher for the voltage present, and prove the meter on a known live source before and ' +
    'after measuring. Only control power is on: the main drive motor stays off and locked out, the flywheel at rest, ' +
    `the clutch disengaged and nobody in the die area. ${PLANT_RULES_FIRST}`,
  covers: ['energized_work'],
};

export const ENERGIZED_MEASUREMENT: SafetyMessage = {
  signalWord: 'WARNING',
  text:
    'Energized circuit. Meter on AC volts, leads on the named terminals only, one hand where practical; keep clear of ' +
    `other terminals and of moving parts. ${PLANT_RULES_FIRST}`,
  covers: ['energized_work'],
};

export const RETURN_TO_SERVICE: SafetyMessage = {
  signalWord: 'WARNING',
  text:
    'Return the press to production only after the post-repair checks: the fault clears; the crank-angle display ' +
    'agrees with top dead centre; the stopping-time and brake-monitor check passes; and every presence-sensing device ' +
    'still sits at or beyond its safety distance for the measured stopping time. Locks come off only under the ' +
    `plant's lockout procedure. ${PLANT_RULES_FIRST}`,
};

export const FIRMWARE_READING: SafetyMessage = {
  signalWord: 'WARNING',
  text:
    'The control is energized while you read the firmware. Read the versions from the operator display or diagnostic ' +
    'screen with the enclosure doors closed. If an enclosure must be opened while live to see a display, that is ' +
    'energized electrical work and the live-work precautions apply (qualified person, PPE, rated meter). The press ' +
    `stays stopped and nobody enters the die area. ${PLANT_RULES_FIRST}`,
  covers: ['energized_work'],
};

export const WORKING_AT_HEIGHT: SafetyMessage = {
  signalWord: 'WARNING',
  text:
    'The crank-angle sensor commonly sits at the end of the crankshaft, high on the press, next to drive guards. ' +
    "Reaching it is work at height: use the ladder, platform or fall protection the plant's rules require, do not " +
    'climb on guards or the press frame, and refit every guard and cover you removed before the press runs. ' +
    PLANT_RULES_FIRST,
  covers: ['working_at_height'],
};

export const SLIDE_MOTION: SafetyMessage = {
  signalWord: 'WARNING',
  text:
    'Setting the crank to top dead centre moves the slide and the flywheel (inching under power or barring the ' +
    'flywheel): crushing hazard and stored energy. Clear the die area of people and tools first. Locks come off for ' +
    "positioning only as the plant's lockout procedure allows for testing or positioning (OSHA 29 CFR 1910.147(f)(1): " +
    'clear the area, remove locks, energize and position, then de-energize and re-apply locks), and your lock goes ' +
    `back on before your hands go back to the sensor. ${PLANT_RULES_FIRST}`,
  covers: ['slide_motion', 'stored_energy'],
};

export const REPAIR_LOCKED_OUT: SafetyMessage = {
  signalWord: 'DANGER',
  text:
    'Replacing or refitting a part (a unit, board, sensor, cable or connector) is done with the press locked and ' +
    "tagged out under the plant's lockout procedure, with your own lock, stored energy relieved and the circuits " +
    'proved dead. After a firmware change or a swapped unit on the press control or its monitoring unit, follow the ' +
    "control maker's validation and repeat the stopping-time and brake-monitor check before production. " +
    PLANT_RULES_FIRST,
  covers: ['unit_swap', 'stored_energy'],
};

export const RELOCK_AFTER_LIVE: SafetyMessage = {
  signalWord: 'WARNING',
  text:
    'Control power is still on after the energized test. Before any hands-on work, and before you leave the press, ' +
    "switch off control power and re-apply your lock and tag under the plant's lockout procedure, then prove the " +
    `circuits dead again. ${PLANT_RULES_FIRST}`,
  covers: ['relock'],
};

export const INSULATION_TEST: SafetyMessage = {
  signalWord: 'WARNING',
  text:
    'An insulation tester applies a high test voltage. Use it only on the cable with BOTH ends disconnected, never on ' +
    'a cable still connected to the sensor or the control: the test voltage can destroy the windings and the ' +
    "control's inputs, and the charged cable can shock. Discharge each conductor after the test; the press stays " +
    `locked out. ${PLANT_RULES_FIRST}`,
  covers: ['insulation_test'],
};

export const BOARD_HANDLING: SafetyMessage = {
  signalWord: 'NOTICE',
  text:
    'Static discharge can damage a board without any visible sign. Wear a grounded wrist strap, hold boards by their ' +
    'edges, keep a removed board in an anti-static bag, and note every cable position before unplugging anything. ' +
    PLANT_RULES_FIRST,
  covers: ['board_handling'],
};
