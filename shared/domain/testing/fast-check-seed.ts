/**
 * One fixed seed for every property test of the engine, so a run (and a mutation run) draws the
 * same cases each time: a mutant is caught or missed the same way on every run. Change it only on
 * purpose, and then re-run `npm run mutation`.
 */
export const FC_SEED = 20_261_202;
