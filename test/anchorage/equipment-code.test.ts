import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { parseEquipment } from '../../src/anchorage/equipment.js';
import { QuakesweepError } from '../../src/base/errors.js';

// The equipment file's edition ("code") and its keys: ASCE/SEI 7-22 §13.3.1 (C_AR, R_po, the
// building's R, Ω₀, I_e for R_μ in §13.3.1.2 and T_a for H_f in §13.3.1.1) and the §11.9 inputs.
const base = {
  name: 'Pump (invented)',
  units: 'SI',
  weight: 10,
  cg_height: 0.5,
  anchors: [
    [-0.5, -0.3],
    [0.5, -0.3],
    [0.5, 0.3],
    [-0.5, 0.3],
  ],
  period_s: 'rigid',
  damping: 0.05,
  z: 0,
  h: 10,
  ip: 1,
  sds: 1,
};
const v716 = { ...base, ap: 2.5, rp: 2 };
const v722 = { ...base, code: 'asce7-22', car: 1.4, rpo: 1.5 };
const building = { building_r: 8, building_omega0: 3, building_ie: 1 };

function refusal(value: object, file = 'pump.json'): QuakesweepError {
  try {
    parseEquipment(JSON.stringify(value, null, 2), file);
  } catch (error) {
    if (error instanceof QuakesweepError) return error;
    throw error;
  }
  throw new Error('expected a refusal');
}

describe('the edition of an equipment file', () => {
  it('is ASCE/SEI 7-16 when "code" is absent (existing files read as before)', () => {
    const e = parseEquipment(JSON.stringify(v716), 'f');
    expect(e.code).toBe('asce7-16');
    expect(e.factors).toEqual({ code: 'asce7-16', ap: 2.5, rp: 2 });
    expect(e.vertical).toBeNull();
  });

  it('reads a 7-22 file at grade without the building, and above grade with it', () => {
    expect(parseEquipment(JSON.stringify(v722), 'f').factors).toEqual({
      code: 'asce7-22',
      car: 1.4,
      rpo: 1.5,
      building: null,
    });
    const roof = parseEquipment(JSON.stringify({ ...v722, z: 10, ...building, building_ta_s: 0.7 }), 'f');
    expect(roof.factors).toMatchObject({ building: { r: 8, omega0: 3, ie: 1, taS: 0.7 } });
  });

  it('accepts the building at grade and keeps it (the outputs say it is not used)', () => {
    const e = parseEquipment(JSON.stringify({ ...v722, ...building }), 'f');
    expect(e.factors).toMatchObject({ building: { r: 8, taS: null } });
  });

  it('reads the invented 7-22 example in records/', () => {
    const file = 'records/equipment-pump-roof-7-22.json';
    const e = parseEquipment(readFileSync(file, 'utf8'), file);
    expect(e.code).toBe('asce7-22');
    expect(e.name).toMatch(/invented/);
    expect(e.vertical).toEqual({ periodS: 0.04, ssG: 1.8, siteClass: 'CD' });
  });
});

describe('refusals name the file and the key', () => {
  it('an unknown edition', () => {
    expect(refusal({ ...v722, code: 'asce7-10' }).describe()).toMatch(
      /^pump\.json:\d+: "code" must be "asce7-16" \(the default\) or "asce7-22"/,
    );
  });

  it('a_p or R_p in a 7-22 file, and 7-22 keys in a 7-16 file', () => {
    expect(refusal({ ...v722, ap: 2.5 }).describe()).toMatch(
      /^pump\.json:\d+: "ap" is an ASCE\/SEI 7-16 coefficient; this file is ASCE\/SEI 7-22 and gives "car" and "rpo" instead/,
    );
    expect(refusal({ ...v716, car: 1 }).describe()).toMatch(
      /^pump\.json:\d+: "car" is an ASCE\/SEI 7-22 coefficient; this file is ASCE\/SEI 7-16, the default when "code" is not given/,
    );
    expect(refusal({ ...v716, building_r: 8 }).message).toMatch(/"building_r" is an ASCE\/SEI 7-22/);
  });

  it('C_AR without R_po and R_po without C_AR', () => {
    const { rpo: _, ...noRpo } = v722;
    const { car: __, ...noCar } = v722;
    expect(refusal(noRpo).describe()).toBe(
      'pump.json: "rpo" is missing: ASCE/SEI 7-22 Eq. 13.3-1 needs both "car" (C_AR) and "rpo" (R_po)',
    );
    expect(refusal(noCar).message).toMatch(/^"car" is missing/);
  });

  it('R_μ inputs missing above grade, or given in part', () => {
    expect(refusal({ ...v722, z: 5 }).describe()).toMatch(
      /^pump\.json: "building_r" is missing: a component above grade \(z > 0\) needs the building's R, Ω₀ and I_e for R_μ \(ASCE\/SEI 7-22 §13\.3\.1\.2\).*not the anchorage "omega0"/,
    );
    const { building_ie: _, ...part } = building;
    expect(refusal({ ...v722, z: 5, ...part }).message).toMatch(
      /^"building_ie" is missing: R_μ .* needs all three of/,
    );
    expect(refusal({ ...v722, ...part }).message).toMatch(/^"building_ie" is missing/); // at grade too
  });

  it('the building’s Ω₀ and the anchorage’s Ω₀ are told apart', () => {
    expect(refusal({ ...v722, z: 5, ...building, building_omega0: 0.5 }).message).toMatch(
      /"building_omega0" must be the building's overstrength factor Ω₀ ≥ 1 .*the component anchorage's Ω₀ is "omega0"/,
    );
    expect(refusal({ ...v722, omega0: 0.5 }).message).toMatch(
      /"omega0" must be null or the component anchorage's overstrength factor Ω₀ ≥ 1 \(the building's Ω₀ for R_μ is "building_omega0"\)/,
    );
  });

  it('bad C_AR, R_po, T_a', () => {
    expect(refusal({ ...v722, car: 0 }).message).toMatch(/"car" must be a positive component resonance/);
    expect(refusal({ ...v722, rpo: 'x' }).message).toMatch(/"rpo" must be a number/);
    expect(refusal({ ...v722, z: 5, ...building, building_ta_s: -1 }).message).toMatch(/"building_ta_s"/);
  });

  it('the vertical inputs: all three or none, T_v ≤ 2.0 s, a site class of the edition', () => {
    const vertical = { vertical_period_s: 0.1, ss: 1, site_class: 'D' };
    expect(parseEquipment(JSON.stringify({ ...v716, ...vertical }), 'f').vertical).toEqual({
      periodS: 0.1,
      ssG: 1,
      siteClass: 'D',
    });
    const { ss: _, ...noSs } = vertical;
    expect(refusal({ ...v716, ...noSs }).describe()).toMatch(
      /^pump\.json: "ss" is missing: the vertical spectral demand \(§11\.9\) needs all three of "vertical_period_s", "ss", "site_class"/,
    );
    expect(refusal({ ...v716, ...vertical, vertical_period_s: 2.5 }).message).toMatch(
      /"vertical_period_s" must be the component's vertical period T_v in s, 0 to 2/,
    );
    expect(refusal({ ...v716, ...vertical, site_class: 'CD' }).message).toMatch(
      /"site_class" must be a site class of ASCE\/SEI 7-16: A, B, C, D, E, F/,
    );
    expect(
      parseEquipment(JSON.stringify({ ...v722, ...vertical, site_class: 'cd' }), 'f').vertical?.siteClass,
    ).toBe('CD');
  });
});
