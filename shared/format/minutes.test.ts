import { formatMinutes } from './minutes';

describe('h:mm for minutes', () => {
  it('shows whole minutes as hours and minutes', () => {
    expect(formatMinutes(95)).toBe('1:35');
    expect(formatMinutes(0)).toBe('0:00');
  });

  it('rounds fractional minutes before splitting, so a minute never reads 60', () => {
    expect(formatMinutes(119.6)).toBe('2:00');
    expect(formatMinutes(59.7)).toBe('1:00');
    expect(formatMinutes(59.4)).toBe('0:59');
  });

  it('shows a dash when there is no time', () => {
    expect(formatMinutes(null)).toBe('—');
  });
});
