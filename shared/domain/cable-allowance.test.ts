import { evaluate, unit } from 'mathjs';
import { awgDiameter, cableLoopResistance, copperResistancePerThousandFeet, IACS_COPPER_OHM_CMIL_PER_FT } from './cable-allowance';

describe('awgDiameter', () => {
  // ASTM B258: d = 0.005 in × 92^((36 − n)/39).
  it('gives 0.005 in for 36 AWG and 0.46 in for 0000 (n = −3), the law\'s anchor points (ASTM B258)', () => {
    expect(awgDiameter(36)).toBeCloseTo(0.005, 12);
    expect(awgDiameter(-3)).toBeCloseTo(0.46, 12);
  });

  it('steps by a diameter ratio of 1.1229322 per gauge (ASTM B258)', () => {
    for (let n = 0; n < 40; n += 1) expect(awgDiameter(n) / awgDiameter(n + 1)).toBeCloseTo(1.1229322, 7);
  });

  it('agrees with mathjs unit conversion for 0.005 in = 0.127 mm (independent units library)', () => {
    expect(awgDiameter(36) * 25.4).toBeCloseTo(evaluate('(0.005 inch) to mm').toNumber('mm'), 12);
  });
});

describe('copperResistancePerThousandFeet', () => {
  it('uses the IACS 1913 resistivity: 1.7241 µΩ·cm = 10.371 Ω·cmil/ft', () => {
    // Independent conversion of 1.7241 µΩ·cm to Ω·cmil/ft with mathjs (1 cmil = π/4 mil²).
    const cmilPerFt = unit('1.7241e-6 ohm cm').toNumber('ohm inch') / ((Math.PI / 4) * 1e-6) * 12;
    expect(cmilPerFt).toBeCloseTo(IACS_COPPER_OHM_CMIL_PER_FT, 2);
  });

  // HyperPhysics wire-gauge table, solid annealed copper at 20 °C (consistent with ASTM B258 and IACS).
  it.each([
    [18, 0.0403, 6.385],
    [20, 0.03196, 10.15],
    [22, 0.02535, 16.14],
    [24, 0.0201, 25.67],
    [26, 0.01594, 40.81],
  ])('AWG %i: diameter %f in and %f Ω/kft at 20 °C (HyperPhysics table)', (awg, diameter, ohms) => {
    expect(awgDiameter(awg)).toBeCloseTo(diameter, 4);
    expect(Math.abs(copperResistancePerThousandFeet(awg) / ohms - 1)).toBeLessThan(5e-4);
  });

  it('comes within 1 % of NEC Chapter 9 Table 8 for 14 AWG at 75 °C, 3.07 Ω/kft (listed stranded; ours is solid)', () => {
    expect(Math.abs(copperResistancePerThousandFeet(14, 75) / 3.07 - 1)).toBeLessThan(0.01);
  });

  it('gives 7.77 Ω/kft for 18 AWG solid at 75 °C (NEC Table 8 value from memory, not confirmed)', () => {
    expect(copperResistancePerThousandFeet(18, 75)).toBeCloseTo(7.77, 1);
  });
});

describe('cableLoopResistance', () => {
  it('50 ft of 24 AWG cable, one way (100 ft of wire in the loop): 2.567 Ω at 20 °C (REFERENCES, computed)', () => {
    const cable = cableLoopResistance({ awg: 24, length: 50, lengthUnit: 'ft', lengthIs: 'one_way' });
    expect(cable.loopLength).toBe(100);
    expect(cable.resistance).toBeCloseTo(2.567, 3);
  });

  it('the same cable at 40 °C: 2.769 Ω (REFERENCES, computed)', () => {
    const cable = cableLoopResistance({ awg: 24, length: 50, lengthUnit: 'ft', lengthIs: 'one_way', temperatureC: 40 });
    expect(cable.resistance).toBeCloseTo(2.769, 3);
  });

  it('a loop length is not doubled: 100 ft given as the whole loop is the same 2.567 Ω', () => {
    expect(cableLoopResistance({ awg: 24, length: 100, lengthUnit: 'ft', lengthIs: 'loop' }).resistance).toBeCloseTo(2.567, 3);
  });

  it('30 m of 22 AWG cable, one way (60 m of wire): 3.178 Ω at 20 °C (REFERENCES, computed)', () => {
    const cable = cableLoopResistance({ awg: 22, length: 30, lengthUnit: 'm', lengthIs: 'one_way' });
    expect(cable.loopLength).toBeCloseTo(unit('60 m').toNumber('ft'), 9); // length conversion checked with mathjs
    expect(cable.resistance).toBeCloseTo(3.178, 3);
  });

  it('uses the fallback temperature when the cable has none', () => {
    const warm = cableLoopResistance({ awg: 24, length: 50, lengthUnit: 'ft', lengthIs: 'one_way' }, 40);
    expect(warm.temperatureC).toBe(40);
    expect(warm.resistance).toBeCloseTo(2.769, 3);
  });
});
