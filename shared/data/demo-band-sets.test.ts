import { bandSetSchema } from '../schemas/band-set';
import { DEMO_BAND_SETS } from './demo-band-sets';

// Trade check values (common practice, no published source), which the seeded demo data must NOT use.
const TRADE_NOMINALS = [89, 70, 36, 90];

describe('DEMO_BAND_SETS', () => {
  it('are valid band sets, marked invented in a field and a note', () => {
    for (const set of DEMO_BAND_SETS) {
      expect(bandSetSchema.safeParse(set).success).toBe(true);
      expect(set.values.invented).toBe(true);
      expect(set.values.note).toContain('Invented demo values');
      expect(set.values.label).toContain('invented');
    }
  });

  it('use nominals clearly different from the trade figures', () => {
    for (const set of DEMO_BAND_SETS) {
      for (const band of Object.values(set.values.windings)) {
        for (const trade of TRADE_NOMINALS) expect(Math.abs(band.nominal - trade) / trade).toBeGreaterThan(0.2);
      }
    }
  });

  it('have one entry per generation key', () => {
    expect(new Set(DEMO_BAND_SETS.map((s) => s.generation)).size).toBe(DEMO_BAND_SETS.length);
  });
});
