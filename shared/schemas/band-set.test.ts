import { bandSetValuesSchema, windingBandSchema } from './band-set';
import { DEMO_BAND_SETS } from '../data/demo-band-sets';

const good = { nominal: 100, inBandPercent: 5, nearEdgePercent: 10, shortBelow: 10, openAbove: 1000 };

describe('windingBandSchema', () => {
  it('accepts a consistent band', () => {
    expect(windingBandSchema.safeParse(good).success).toBe(true);
  });

  it.each([
    [{ ...good, nearEdgePercent: 5 }, 'near-edge tolerance must be wider'],
    [{ ...good, shortBelow: 95 }, 'short threshold'],
    [{ ...good, openAbove: 105 }, 'open threshold'],
    [{ ...good, nominal: -1 }, ''],
  ])('rejects an inconsistent band (%j)', (band, message) => {
    const result = windingBandSchema.safeParse(band);
    expect(result.success).toBe(false);
    if (!result.success) expect(result.error.issues.map((i) => i.message).join(' ')).toContain(message);
  });
});

describe('bandSetValuesSchema', () => {
  it('rejects a voltage range whose max is not above its min', () => {
    const values = structuredClone(DEMO_BAND_SETS[0]!.values);
    values.excitation = { min: 5, max: 4, nearEdgePercent: 5 };
    expect(bandSetValuesSchema.safeParse(values).success).toBe(false);
  });
});
