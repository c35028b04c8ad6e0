// One list of step-kind names for every screen; it lives with the procedure schema.
export { STEP_KIND_LABELS } from '@shared/schemas/procedure';
