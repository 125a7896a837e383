import { formatSignificant } from '../../../shared/units/format-significant';
import { parseQuantity } from '../../../shared/units/parse-quantity';
import { quantityKinds, type QuantityKind } from '../../../shared/units/quantity-kinds';
import { displayUnits, formatInSystem, withPowerOfTen, type UnitSystem } from '../../lib/unit-system';

export type ParsedQuantity = { ok: true; text: string; si: number; kind: QuantityKind } | { ok: false; text: string } | { ok: null; text: '' };

/**
 * What the server will read from a typed quantity, for the live note beside an input:
 * "= 0.01200 Pa·s · 12.00 cP" (SI, then the person's units when they differ) or the reason it
 * cannot be read. The first kind that reads the text wins (a viscosity may be typed dynamic,
 * "12 cP", or kinematic, "15 cSt").
 */
export function describeParsedQuantity(text: string, kinds: readonly QuantityKind[], system?: UnitSystem): ParsedQuantity {
  if (!text.trim()) return { ok: null, text: '' };
  let firstError = '';
  for (const kind of kinds) {
    try {
      const si = parseQuantity(text, kind);
      const siText = `${withPowerOfTen(formatSignificant(si, 4))} ${quantityKinds[kind].siSymbol}`;
      const ownUnit = system ? displayUnits[system][kind] : undefined;
      const own = ownUnit && ownUnit !== quantityKinds[kind].siSymbol ? ` · ${formatInSystem(si, kind, system!)}` : '';
      return { ok: true, text: `= ${siText}${own}`, si, kind };
    } catch (error) {
      firstError ||= error instanceof Error ? error.message : String(error);
    }
  }
  return { ok: false, text: firstError };
}
