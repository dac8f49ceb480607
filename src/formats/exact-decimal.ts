/** The doubles next to `x` (x is finite): the next one down and the next one up. */
function neighbours(x: number): [number, number] {
  const bits = new Float64Array([x]);
  const integer = new BigInt64Array(bits.buffer);
  if (x === 0) return [-Number.MIN_VALUE, Number.MIN_VALUE];
  const away = () => {
    integer[0] += 1n;
    return bits[0];
  };
  const toward = () => {
    integer[0] -= 1n;
    return bits[0];
  };
  // The bit pattern grows with |x|, so "away from zero" is up for x > 0 and down for x < 0.
  const start = integer[0];
  const far = away();
  integer[0] = start;
  const near = toward();
  return x > 0 ? [near, far] : [far, near];
}

/**
 * The shortest decimal text of `si / factor` (a value in SI written in a unit that is `factor` SI
 * units) that a reader multiplying by `factor` turns back into `si` exactly: JavaScript's own
 * shortest round-trip form of the quotient (ECMA-262 Number::toString) when it does, else of the
 * quotient's neighbour that does; the quotient's own form when none does (then within one unit
 * in the last place).
 */
export function exactDecimal(si: number, factor: number): string {
  const quotient = si / factor;
  const text = String(quotient);
  if (factor === 1 || Number(text) * factor === si) return text;
  for (const candidate of neighbours(quotient)) if (candidate * factor === si) return String(candidate);
  return text;
}
