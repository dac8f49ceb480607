/**
 * The frequency f = 1/T, Hz, of each period of a grid, for the outputs beside the periods; T = 0
 * (rigid: f = ∞, which JSON cannot hold) gives null, an empty CSV cell.
 */
export function frequenciesHz(periodsS: ArrayLike<number>): (number | null)[] {
  return Array.from(periodsS, frequencyHz);
}

/** f = 1/T, Hz, of one period; null at T = 0. */
export function frequencyHz(periodS: number): number | null {
  return periodS > 0 ? 1 / periodS : null;
}
