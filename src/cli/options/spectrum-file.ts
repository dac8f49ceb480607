import { readFileSync } from 'node:fs';
import type { ElasticInput } from '../../anchorage/anchorage.js';
import { psaAtPeriod } from '../../anchorage/elastic-demand.js';
import type { Equipment } from '../../anchorage/equipment.js';
import { inputError } from '../../base/errors.js';

/**
 * Read the component's PSA from a spectrum JSON file, checking the fields it needs; a floor
 * spectrum's note states its building. A floor JSON of several records (`quakesweep floor REC1
 * REC2 …`) gives its envelope, which the note says.
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
  const envelope = floorEnvelope(object, file);
  const spectra = envelope ? envelope['spectra'] : object?.['spectra'];
  const where = envelope ? 'envelope.spectra' : 'spectra';
  if (!Array.isArray(periods) || !periods.every((t) => typeof t === 'number')) {
    throw inputError('"periods_s" must be a list of periods (s); is this spectrum JSON?', { file });
  }
  const badPeriod = periods.findIndex(
    (t, i) => !Number.isFinite(t) || t < 0 || (i > 0 && !(t > periods[i - 1])),
  );
  if (badPeriod >= 0) {
    const t = periods[badPeriod];
    const why =
      !Number.isFinite(t) || t < 0
        ? 'is not a finite period ≥ 0 s'
        : `does not follow ${periods[badPeriod - 1]} upwards`;
    throw inputError(
      `"periods_s"[${badPeriod}] = ${t} ${why}; periods must be finite, ≥ 0 and strictly ascending (only the first may be 0, the rigid one)`,
      { file },
    );
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
    throw inputError(`"${where}[${index}].psa_g" must be a list of ${periods.length} numbers`, { file });
  }
  const badPsa = psa.findIndex((v) => !Number.isFinite(v) || v < 0);
  if (badPsa >= 0)
    throw inputError(
      `"${where}[${index}].psa_g"[${badPsa}] = ${psa[badPsa]} at T = ${periods[badPsa]} s: a PSA must be a finite number ≥ 0`,
      { file },
    );
  const building = object['building'] as Record<string, unknown> | undefined;
  const isFloor = building !== undefined && building !== null;
  let value: ElasticInput;
  if (equipment.periodS === 'rigid') {
    const zero = periods.indexOf(0);
    const pga = envelope
      ? envelope['pga_g']
      : (object['record'] as Record<string, unknown> | undefined)?.['pga_g'];
    const pgaKey = envelope ? 'envelope.pga_g' : 'record.pga_g';
    if (zero >= 0)
      value = { psaG: psa[zero], how: 'PSA at T = 0 (PGA) of the spectrum, rigid component', source: file };
    else if (typeof pga === 'number' && Number.isFinite(pga) && pga >= 0)
      value = { psaG: pga, how: `"${pgaKey}" of the spectrum file, rigid component`, source: file };
    else throw inputError(`has neither T = 0 nor "${pgaKey}" for a rigid component`, { file });
  } else {
    value = { ...psaAtPeriod(periods, psa, equipment.periodS, file), source: file };
  }
  const broadening = object['broadening'] as Record<string, unknown> | null | undefined;
  const floorNote = isFloor
    ? `${envelope ? envelopeWords(object) : 'Floor spectrum'}: building T_b = ${building['period_s']} s, ζ_b = ${building['damping']}, Γφ = ${building['modal_factor']}` +
      `${broadening ? `, peaks broadened ±${broadening['fraction']}${envelope ? ' (each record before the envelope)' : ''}` : ', not broadened'}; this tool does not check that Γφ belongs to the floor at z.`
    : '';
  return { value, isFloor, floorNote };
}

/**
 * The "envelope" of a floor JSON of several records, checked; undefined for a spectrum JSON or a
 * floor JSON of one record (they have "spectra" at the top).
 */
function floorEnvelope(object: Record<string, unknown>, file: string): Record<string, unknown> | undefined {
  if (object === null || typeof object !== 'object' || object['spectra'] !== undefined) return undefined;
  const envelope = object['envelope'];
  if (envelope === undefined) return undefined;
  if (envelope === null || typeof envelope !== 'object' || !Array.isArray(object['records']))
    throw inputError(
      '"envelope" must be an object beside "records"; is this the JSON of `quakesweep floor`?',
      {
        file,
      },
    );
  return envelope as Record<string, unknown>;
}

/** "Floor envelope of N records (a, b, …)", from the records' labels. */
function envelopeWords(object: Record<string, unknown>): string {
  const records = object['records'] as unknown[];
  const labels = records.map((r) => String((r as Record<string, unknown>)?.['label'] ?? '?'));
  return `Floor envelope of ${records.length} records (${labels.join(', ')}); the envelope is used, not the mean nor one record`;
}
