/** The live note beside a unit-aware box. Factors: NIST SP 811 (2008) Appendix B.8/B.9 (1 cP = 10⁻³ Pa·s, 1 cSt = 10⁻⁶ m²/s, 1 dyn/cm = 10⁻³ N/m). */
import { describe, expect, it } from 'vitest';
import { describeParsedQuantity } from './parsed-quantity';

describe('describeParsedQuantity', () => {
  it('reads "12 cP" as 0.012 Pa·s and adds the person’s units when they differ from SI', () => {
    const parsed = describeParsedQuantity('12 cP', ['dynamicViscosity', 'kinematicViscosity'], 'floor');
    expect(parsed).toMatchObject({ ok: true, text: '= 0.01200 Pa·s · 12.00 mPa·s', kind: 'dynamicViscosity' });
  });

  it('falls back to the second kind: "15 cSt" is a kinematic viscosity', () => {
    const parsed = describeParsedQuantity('15 cSt', ['dynamicViscosity', 'kinematicViscosity']);
    expect(parsed).toMatchObject({ ok: true, kind: 'kinematicViscosity', text: '= 0.00001500 m²/s' });
  });

  it('reads "35 dyn/cm" as 0.035 N/m', () => {
    expect(describeParsedQuantity('35 dyn/cm', ['surfaceTension']).text).toBe('= 0.03500 N/m');
  });

  it('says why a text cannot be read, naming the quantity, and is silent for an empty box', () => {
    const parsed = describeParsedQuantity('12 furlongs', ['length']);
    expect(parsed.ok).toBe(false);
    expect(parsed.text).toContain('length');
    expect(describeParsedQuantity('  ', ['length'])).toEqual({ ok: null, text: '' });
  });
});
