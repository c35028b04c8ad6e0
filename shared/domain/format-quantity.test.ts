import { formatPercent, formatSi, UNIT_SYMBOL } from './format-quantity';

// SI prefixes k = 10³, M = 10⁶, m = 10⁻³ (BIPM, The International System of Units, 9th ed., Table 7).
describe('formatSi', () => {
  it.each([
    [0, 'resistance', '0 Ω'],
    [88.4, 'resistance', '88.4 Ω'],
    [1, 'resistance', '1 Ω'],
    [999.94, 'resistance', '999.9 Ω'],
    [1000, 'resistance', '1 kΩ'],
    [2567.4, 'resistance', '2.567 kΩ'],
    [1.2e6, 'resistance', '1.2 MΩ'],
    [4.25, 'ac_voltage', '4.25 V'],
    [0.0042, 'ac_voltage', '4.2 mV'],
    [0.999, 'ac_voltage', '999 mV'],
    [1e-5, 'ac_voltage', '0.01 mV'], // below the smallest prefix: still in mV
    [-2500, 'resistance', '-2.5 kΩ'], // the prefix follows the size, not the sign
  ] as const)('%f (%s) → %s (four significant figures, engineering prefix)', (value, quantity, shown) => {
    expect(formatSi(value, quantity)).toBe(shown);
  });

  it('uses Ω for resistance and V for AC voltage', () => {
    expect(UNIT_SYMBOL).toEqual({ resistance: 'Ω', ac_voltage: 'V' });
  });
});

describe('formatPercent', () => {
  it.each([
    [0.5, '0.50 %'],
    [-0.5, '-0.50 %'],
    [1, '1.0 %'],
    [7, '7.0 %'],
    [-5, '-5.0 %'],
    [12.345, '12.3 %'],
  ])('%f → %s (two decimals below 1 %, else one)', (value, shown) => {
    expect(formatPercent(value)).toBe(shown);
  });
});
