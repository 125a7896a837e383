/** Units layer: parse, format and convert the trade's units into and out of SI. */
export * from './constants';
export { convertQuantity } from './convert';
export { formatQuantity } from './format-quantity';
export { formatSignificant } from './format-significant';
export { fromSi } from './from-si';
export { normalizeUnitText } from './normalize-unit-text';
export { parseQuantity, type ParseQuantityOptions } from './parse-quantity';
export {
  quantityKinds,
  type AbsoluteTemperature,
  type QuantityKind,
  type QuantityKindInfo,
  type SiValue,
  type TemperatureDifference,
} from './quantity-kinds';
export { resolveUnit } from './resolve-unit';
export { toSi } from './to-si';
export { UnitError } from './unit-error';
export { createUnitMath, unitMath } from './unit-math';
