import { describe, expect, it } from 'vitest';
import { UnprocessableError } from '../../errors';
import { fieldOf, withPhysicsFieldErrors } from './physics-range-error';

describe('physics RangeError → 422 naming the field', () => {
  it('reads the dotted field path at the start of a physics message', () => {
    expect(fieldOf('wetThickness must be ≤ 0.05 m (a thin film), got 0.06')).toBe('wetThickness');
    expect(fieldOf('oven.zones[1].length must be > 0 m')).toBe('oven.zones.1.length');
    expect(fieldOf('solvent.lowerFlammableLimit must be a volume fraction < 1', 'input')).toBe('input.solvent.lowerFlammableLimit');
    expect(fieldOf('No sample gave a margin')).toBe('_');
    expect(fieldOf('air properties are required when oven.zones[0].massTransferCoefficient is not given')).toBe('_');
    expect(fieldOf('—')).toBe('_');
  });

  it('turns a RangeError into a 422 and lets other errors through', () => {
    expect(() => withPhysicsFieldErrors(() => { throw new RangeError('rtol must be in [1e-12, 1e-3], got 1'); })).toThrow(UnprocessableError);
    try {
      withPhysicsFieldErrors(() => { throw new RangeError('rtol must be in [1e-12, 1e-3], got 1'); });
    } catch (error) {
      expect((error as UnprocessableError).status).toBe(422);
      expect((error as UnprocessableError).fields).toEqual({ rtol: 'rtol must be in [1e-12, 1e-3], got 1' });
    }
    expect(() => withPhysicsFieldErrors(() => { throw new TypeError('bug'); })).toThrow(TypeError);
    expect(withPhysicsFieldErrors(() => 3)).toBe(3);
  });
});
