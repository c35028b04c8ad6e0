import fc from 'fast-check';
import { FC_SEED } from './testing/fast-check-seed';
import { unit } from 'mathjs';
import { formatSi } from './format-quantity';
import { entryQuestion, parseEntry, type ParsedEntry } from './parse-entry';

const valueOf = (p: ParsedEntry) => (p.ok && p.kind === 'value' ? p.value : Number.NaN);

describe('parseEntry', () => {
  it.each([
    ['89', 89],
    ['89.3 Ω', 89.3],
    ['89.3Ω', 89.3],
    ['89.3 \u2126', 89.3], // the ohm sign U+2126, as some keyboards produce
    ['89.3ohm', 89.3],
    ['89.3 Ohms', 89.3],
    ['0.0893k', 89.3],
    ['0.0893 kΩ', 89.3],
    ['0.0893 kohm', 89.3],
    ['1.2 MΩ', 1.2e6],
    ['.5', 0.5],
    ['  70  ', 70],
  ])('reads the resistance %s as %f Ω', (entered, expected) => {
    expect(valueOf(parseEntry(entered, 'resistance'))).toBeCloseTo(expected, 9);
  });

  it.each([
    ['4.2 V', 4.2],
    ['4.2V', 4.2],
    ['4200 mV', 4.2],
    ['4.2 VAC', 4.2],
    ['4.2 V~', 4.2],
    ['2.25', 2.25],
  ])('reads the AC voltage %s as %f V', (entered, expected) => {
    expect(valueOf(parseEntry(entered, 'ac_voltage'))).toBeCloseTo(expected, 9);
  });

  it.each(['OL', 'O.L', 'ol', 'O.L.', 'o.l', '0L'])('reads the meter display %s as over range', (entered) => {
    expect(parseEntry(entered, 'resistance')).toEqual({ ok: true, kind: 'over_range' });
  });

  it('agrees with mathjs on SI prefixes (independent units library)', () => {
    const cases: Array<[string, string]> = [
      ['0.0893 kΩ', '0.0893 kohm'],
      ['1.2 MΩ', '1.2 Mohm'],
      ['470 mΩ', '470 mohm'],
    ];
    for (const [ours, theirs] of cases) {
      expect(valueOf(parseEntry(ours, 'resistance'))).toBeCloseTo(unit(theirs).toNumber('ohm'), 9);
    }
    expect(valueOf(parseEntry('4200 mV', 'ac_voltage'))).toBeCloseTo(unit('4200 mV').toNumber('V'), 12);
  });

  // A decimal comma where it cannot be a thousands separator (one comma, not followed by exactly
  // three digits) is read as a point, since the tablet's decimal keypad may offer only a comma.
  it.each([
    ['4,2', 4.2],
    ['4,25 V', 4.25],
    [',5', 0.5],
    ['89,3531', 89.3531],
  ])('reads the decimal comma in %s as %f', (entered, expected) => {
    expect(valueOf(parseEntry(entered, 'ac_voltage'))).toBeCloseTo(expected, 9);
  });

  it.each(['1,200', '1,200 Ω', '1,2,3', '1.2,5'])('refuses %s, where the comma could be a thousands separator', (entered) => {
    expect(parseEntry(entered, 'resistance')).toEqual({ ok: false, error: expect.stringContaining('thousands separator') });
  });

  // Plausibility bounds (common practice, no published source): handheld meters top out at tens of
  // MΩ and are rated up to 1000 V.
  it('refuses absurd values with a message that says what to check', () => {
    expect(parseEntry('1e24', 'resistance')).toEqual({ ok: false, error: expect.stringMatching(/^1e24 is more than a multimeter can show.*type OL/) });
    expect(parseEntry('2 GΩ', 'resistance').ok).toBe(false);
    expect(valueOf(parseEntry('1 GΩ', 'resistance'))).toBe(1e9);
    expect(parseEntry('1200 V', 'ac_voltage')).toEqual({ ok: false, error: expect.stringContaining('m is milli') });
    expect(valueOf(parseEntry('1000 V', 'ac_voltage'))).toBe(1000);
  });

  // Common practice, no published source: a 3½-digit meter shows a lone 1 at the left for over
  // range; no winding of this circuit reads below 1 Ω, so such a value is usually m typed for M.
  it('asks before saving a lone 1 or a winding below 1 Ω, and nothing else', () => {
    expect(entryQuestion('1', 'resistance')?.kind).toBe('lone_one');
    expect(entryQuestion(' 1 ', 'ac_voltage')?.kind).toBe('lone_one');
    expect(entryQuestion('1.2m', 'resistance')).toMatchObject({ kind: 'below_one_ohm', question: expect.stringContaining('m is milli, M is mega') });
    expect(entryQuestion('0.4', 'resistance')?.kind).toBe('below_one_ohm');
    expect(entryQuestion('1.0', 'resistance')).toBeNull();
    expect(entryQuestion('1 Ω', 'resistance')).toBeNull();
    expect(entryQuestion('0.8', 'ac_voltage')).toBeNull();
    expect(entryQuestion('89.3', 'resistance')).toBeNull();
    expect(entryQuestion('OL', 'resistance')).toBeNull();
  });

  it('refuses a voltage typed into a resistance field, and the reverse', () => {
    expect(parseEntry('4.2 V', 'resistance')).toEqual({ ok: false, error: expect.stringContaining('That is a voltage') });
    expect(parseEntry('4200 mV', 'resistance')).toEqual({ ok: false, error: expect.stringContaining('That is a voltage') });
    expect(parseEntry('89 Ω', 'ac_voltage')).toEqual({ ok: false, error: expect.stringContaining('That is a resistance') });
  });

  it('tells the technician to switch the meter to AC when DC volts are typed', () => {
    expect(parseEntry('4.2 VDC', 'ac_voltage')).toEqual({ ok: false, error: expect.stringContaining('set the meter to AC volts') });
  });

  it.each(['', 'abc', '89 Ωx', '8 9', 'kΩ', '-5', '1e999'])('gives an actionable error for %j', (entered) => {
    const result = parseEntry(entered, 'resistance');
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.error).toMatch(/Type|type|negative|large|empty/);
  });

  it('names the accepted units in the resistance field error', () => {
    expect(parseEntry('abc', 'resistance')).toEqual({
      ok: false,
      error: 'Type a number such as 89.3, optionally with a unit (Ω, kΩ, MΩ), or OL when the meter shows OL.',
    });
  });

  it('round-trips any formatted resistance to within the four figures shown (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 5e7, noNaN: true }), (value) => {
        const back = valueOf(parseEntry(formatSi(value, 'resistance'), 'resistance'));
        expect(Math.abs(back - value) / value).toBeLessThanOrEqual(5e-4);
      }), { seed: FC_SEED },
    );
  });

  it('round-trips any formatted voltage to within the four figures shown (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 1000, noNaN: true }), (value) => {
        const back = valueOf(parseEntry(formatSi(value, 'ac_voltage'), 'ac_voltage'));
        expect(Math.abs(back - value) / value).toBeLessThanOrEqual(5e-4);
      }), { seed: FC_SEED },
    );
  });

  it('parses plain decimal text exactly as Number does (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1e9, noNaN: true, noDefaultInfinity: true }), (value) => {
        const text = value.toString();
        fc.pre(!text.includes('e'));
        expect(valueOf(parseEntry(text, 'resistance'))).toBe(Number(text));
      }), { seed: FC_SEED },
    );
  });
});

describe('parseEntry — anchors, number forms and units', () => {
  it.each([
    ['1e3', 1000],
    ['1E3 Ω', 1000],
    ['1e+3', 1000],
    ['2.5e-3 kΩ', 2.5],
    ['89.', 89],
    ['+5', 5],
    ['89   Ω', 89],
    ['4.7k', 4700],
    ['4.7 K', 4700],
    ['1G', 1e9],
    ['2M', 2e6],
    ['470m', 0.47],
    ['470 mΩ', 0.47],
    ['470 ohms', 470],
    ['0.0893 KΩ', 89.3],
  ])('reads the resistance %s as %f Ω (SI prefixes, BIPM SI Brochure Table 7; K for kilo as meters print it)', (entered, expected) => {
    expect(valueOf(parseEntry(entered, 'resistance'))).toBeCloseTo(expected, 9);
  });

  it.each([
    ['4.2 volts', 4.2],
    ['4.2 volt', 4.2],
    ['4.2 v ac', 4.2],
    ['4.2 Vrms', 4.2],
    ['4.2 V RMS', 4.2],
    ['4200 mv', 4.2],
    ['4200 m V', 4.2],
    ['2u', 2e-6],
    ['2µ', 2e-6],
    ['2μV', 2e-6],
  ])('reads the AC voltage %s as %f V', (entered, expected) => {
    expect(valueOf(parseEntry(entered, 'ac_voltage'))).toBeCloseTo(expected, 12);
  });

  it.each(['x89', 'about 89', '89 Ω Ω', 'Ω89', '89 kΩx'])('refuses %j: the number must come first and the unit must be whole', (entered) => {
    expect(parseEntry(entered, 'resistance')).toEqual({ ok: false, error: expect.stringContaining('Type a number such as 89.3') });
  });

  it.each(['O L', '0 L', 'O. L.', 'OL.'])('reads the display %s as over range', (entered) => {
    expect(parseEntry(entered, 'ac_voltage')).toEqual({ ok: true, kind: 'over_range' });
  });

  it.each(['OLx', 'xOL', 'OLL', 'O..L'])('does not read %s as over range', (entered) => {
    expect(parseEntry(entered, 'resistance').ok).toBe(false);
  });

  it('refuses a negative reading, including −0, saying to type what the meter shows', () => {
    for (const entered of ['-5', '-0', '-0.0 V']) {
      expect(parseEntry(entered, 'ac_voltage')).toEqual({ ok: false, error: expect.stringContaining('cannot be negative') });
    }
    expect(parseEntry('0', 'ac_voltage')).toEqual({ ok: true, kind: 'value', value: 0 });
  });

  it('an empty field says it is empty and what to type for that quantity', () => {
    expect(parseEntry('   ', 'ac_voltage')).toEqual({ ok: false, error: 'The reading is empty. Type a number such as 4.2, optionally with a unit (V or mV).' });
  });

  it('a number too large for a double says so', () => {
    expect(parseEntry('1e999', 'resistance')).toEqual({ ok: false, error: expect.stringContaining('too large') });
    expect(parseEntry('1e300 G', 'resistance')).toEqual({ ok: false, error: expect.stringContaining('too large') });
  });

  it('DC volts: in the AC field, set the meter to AC; in the resistance field, it is a voltage', () => {
    for (const entered of ['4.2 V DC', '4.2 v=', '4200 mVDC']) {
      expect(parseEntry(entered, 'ac_voltage')).toEqual({ ok: false, error: expect.stringContaining('set the meter to AC volts') });
    }
    expect(parseEntry('4.2 VDC', 'resistance')).toEqual({ ok: false, error: expect.stringContaining('That is a voltage') });
  });

  it('an unknown unit in the voltage field gives the voltage help', () => {
    expect(parseEntry('4.2 A', 'ac_voltage')).toEqual({ ok: false, error: 'Type a number such as 4.2, optionally with a unit (V or mV).' });
    expect(parseEntry('4.2 kA', 'ac_voltage')).toEqual({ ok: false, error: 'Type a number such as 4.2, optionally with a unit (V or mV).' });
  });
});

describe('parseEntry — edges of the accepted forms', () => {
  it('the ohm sign (U+2126) is read as Ω: typed into the voltage field it is a resistance, not 89 V', () => {
    expect(parseEntry('89 \u2126', 'ac_voltage')).toEqual({ ok: false, error: expect.stringContaining('That is a resistance') });
  });

  it('runs of spaces inside a unit count as one: "4.2 v  ac" is 4.2 V', () => {
    expect(valueOf(parseEntry('4.2 v  ac', 'ac_voltage'))).toBe(4.2);
  });

  it('a decimal with no leading digit keeps every digit: ".25" is 0.25', () => {
    expect(valueOf(parseEntry('.25', 'ac_voltage'))).toBe(0.25);
    expect(valueOf(parseEntry('.125 kΩ', 'resistance'))).toBe(125);
  });

  it('an unknown letter before a unit is not read as a prefix: "4.2 xV" gets the voltage help, not a number error', () => {
    expect(parseEntry('4.2 xV', 'ac_voltage')).toEqual({ ok: false, error: 'Type a number such as 4.2, optionally with a unit (V or mV).' });
  });

  it('DC is recognised only as a whole unit: "4.2 xvdc" and "4.2 Vdcx" get the voltage help', () => {
    for (const entered of ['4.2 xvdc', '4.2 Vdcx']) {
      expect(parseEntry(entered, 'ac_voltage')).toEqual({ ok: false, error: 'Type a number such as 4.2, optionally with a unit (V or mV).' });
    }
  });

  it('a decimal comma after a sign is still a decimal comma, and text before the number is refused', () => {
    expect(valueOf(parseEntry('+4,2', 'ac_voltage'))).toBe(4.2);
    expect(parseEntry('x4,25', 'ac_voltage').ok).toBe(false);
  });

  it('the lone-1 question is asked for a lone 1 only, and says what OL means', () => {
    expect(entryQuestion('1', 'resistance')?.question).toMatch(/lone 1.*over range \(OL\)/);
    expect(entryQuestion('11', 'resistance')).toBeNull();
    expect(entryQuestion('21', 'ac_voltage')).toBeNull();
  });
});
