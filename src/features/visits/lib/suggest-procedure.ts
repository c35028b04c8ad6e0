/** The procedures the start form offers (one, kept here until published procedures are listed to technicians), with the words in a displayed fault that point to each. */
export const PROCEDURE_CHOICES = [
  {
    key: 'crank-angle-sensor-circuit',
    title: 'Crank-angle sensor circuit fault',
    symptoms: ['crank', 'angle', 'resolver', 'sensor', 'position', 'tdc', 'stroke'],
  },
] as const;

export type ProcedureChoice = (typeof PROCEDURE_CHOICES)[number];

/** Why a procedure is offered for the fault as typed; there is only one so far, so it is always offered. */
export function suggestProcedure(fault: string): { choice: ProcedureChoice; because: string } {
  const words = fault.toLowerCase();
  const choice = PROCEDURE_CHOICES[0];
  const hit = choice.symptoms.find((s) => words.includes(s));
  return {
    choice,
    because: hit
      ? `Suggested because the fault mentions “${hit}”.`
      : 'The one procedure available so far; it covers faults on the crank-angle sensor circuit.',
  };
}
