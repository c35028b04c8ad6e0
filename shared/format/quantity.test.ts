import { describe, expect, it } from 'vitest';
import { formatQuantity } from './quantity';

describe('a value with its unit', () => {
  it('writes the value, a space and the unit, as SI does', () => {
    expect(formatQuantity(180, 'ms')).toBe('180 ms');
    expect(formatQuantity(35, '°C')).toBe('35 °C');
  });

  it('shows a dash when there is no value', () => {
    expect(formatQuantity(null, 'ms')).toBe('—');
  });
});
