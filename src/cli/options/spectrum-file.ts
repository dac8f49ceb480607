import { readFileSync } from 'node:fs';
import type { ElasticInput } from '../../anchorage/anchorage.js';
import { psaAtPeriod } from '../../anchorage/elastic-demand.js';
import type { Equipment } from '../../anchorage/equipment.js';
import { inputError } from '../../base/errors.js';

/**
 * Read the component's PSA from a spectrum JSON file, checking the fields it needs; a floor
 * spectrum's note states its building.
 */
export function readSpectrumFile(
  file: string,
  equipment: Equipment,
): { value: ElasticInput; isFloor: boolean; floorNote: string } {
  let data: unknown;
  try {
    data = JSON.parse(readFileSync(file, 'utf8'));
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code) throw error;
    throw inputError('not valid JSON; expected the output of `quakesweep spectrum --format json`', { file });
  }
  const object = data as Record<string, unknown>;
  const periods = object?.['periods_s'];
  const spectra = object?.['spectra'];
  if (!Array.isArray(periods) || !periods.every((t) => typeof t === 'number')) {
    throw inputError('"periods_s" must be a list of periods (s); is this spectrum JSON?', { file });
  }
  if (!Array.isArray(spectra) || spectra.length === 0) {
    throw inputError('"spectra" must be a non-empty list of curves; is this spectrum JSON?', { file });
  }
  const dampings = spectra.map((curve) => (curve as Record<string, unknown>)?.['damping']);
  const index = dampings.findIndex((d) => typeof d === 'number' && Math.abs(d - equipment.damping) < 1e-9);
  if (index < 0) {
    throw inputError(
      `has no curve at the component's damping ${equipment.damping} (it has ${dampings.join(', ')}); ` +
        `compute one with --damping ${equipment.damping * 100}%`,
      { file },
    );
  }
  const psa = (spectra[index] as Record<string, unknown>)['psa_g'];
  if (!Array.isArray(psa) || psa.length !== periods.length || !psa.every((v) => typeof v === 'number')) {
    throw inputError(`"spectra[${index}].psa_g" must be a list of ${periods.length} numbers`, { file });
  }
  const building = object['building'] as Record<string, unknown> | undefined;
  const isFloor = building !== undefined && building !== null;
  let value: ElasticInput;
  if (equipment.periodS === 'rigid') {
    const zero = periods.indexOf(0);
    const pga = (object['record'] as Record<string, unknown> | undefined)?.['pga_g'];
    if (zero >= 0)
      value = { psaG: psa[zero], how: 'PSA at T = 0 (PGA) of the spectrum, rigid component', source: file };
    else if (typeof pga === 'number')
      value = { psaG: pga, how: '"record.pga_g" of the spectrum file, rigid component', source: file };
    else throw inputError('has neither T = 0 nor "record.pga_g" for a rigid component', { file });
  } else {
    value = { ...psaAtPeriod(periods, psa, equipment.periodS, file), source: file };
  }
  const broadening = object['broadening'] as Record<string, unknown> | null | undefined;
  const floorNote = isFloor
    ? `Floor spectrum: building T_b = ${building['period_s']} s, ζ_b = ${building['damping']}, Γφ = ${building['modal_factor']}` +
      `${broadening ? `, peaks broadened ±${broadening['fraction']}` : ', not broadened'}; this tool does not check that Γφ belongs to the floor at z.`
    : '';
  return { value, isFloor, floorNote };
}
