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
    "that the equipment's labels and the plant's program require. Use a meter and leads rated CAT III (IEC 61010-1) " +
    'or higher for the voltage present, and prove the meter on a known live source before and after measuring ' +
    '(live-dead-live). The press stays stopped with the clutch disengaged and nobody in the die area. ' +
    PLANT_RULES_FIRST,
};

export const ENERGIZED_MEASUREMENT: SafetyMessage = {
  signalWord: 'WARNING',
  text:
    'Energized circuit. Meter on AC volts, leads on the named terminals only, one hand where practical; keep clear of ' +
    `other terminals and of moving parts. ${PLANT_RULES_FIRST}`,
};

export const RETURN_TO_SERVICE: SafetyMessage = {
  signalWord: 'WARNING',
  text:
    'Return the press to production only after the post-repair checks: the fault clears; the crank-angle display ' +
    'agrees with top dead centre; the stopping-time and brake-monitor check passes; and every presence-sensing device ' +
    'still sits at or beyond its safety distance for the measured stopping time. Locks come off only under the ' +
    `plant's lockout procedure. ${PLANT_RULES_FIRST}`,
};
