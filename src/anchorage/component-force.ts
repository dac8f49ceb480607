import { formatNumber } from '../base/numbers.js';
import { verticalSpectrum } from '../spectrum/vertical.js';
import { type CodeForce, codeHorizontalForce } from './code-force.js';
import { type Asce722Force, asce722HorizontalForce } from './code-force-7-22.js';
import type { Equipment } from './equipment.js';
import { BUILDING_KEYS, BUILDING_PERIOD_KEY, EDITION_NAMES } from './equipment-code.js';

/** The code force of either edition, with the edition it follows. */
export type ComponentForce = (CodeForce & { edition: 'asce7-16' }) | Asce722Force;

/** The design horizontal force of the component by the edition its file names (§13.3.1 of either). */
export function componentForce(equipment: Equipment): ComponentForce {
  const f = equipment.factors;
  if (f.code === 'asce7-16') return { edition: 'asce7-16', ...codeHorizontalForce({ ...equipment, ...f }) };
  return asce722HorizontalForce({ ...equipment, car: f.car, rpo: f.rpo, building: f.building });
}

/** The vertical spectral demand S_av(T_v)·W_p: for information beside E_v, never in the combinations. */
export interface VerticalSpectralDemand {
  /** The component's vertical period T_v, s (0 for a rigid component). */
  periodS: number;
  rigid: boolean;
  cv: number;
  savG: number;
  /** S_av·W_p, kN. */
  forceKN: number;
  /** The spectrum's description (standard, §11.9, parameters). */
  description: string;
}

/** S_av(T_v)·W_p from the §11.9 design vertical spectrum of the file's edition, or null without its inputs. */
export function verticalSpectralDemand(equipment: Equipment): VerticalSpectralDemand | null {
  const v = equipment.vertical;
  if (v === null) return null;
  const spectrum = verticalSpectrum({
    edition: equipment.code,
    sdsG: equipment.sds,
    ssG: v.ssG,
    siteClass: v.siteClass,
  });
  const periodS = v.periodS === 'rigid' ? 0 : v.periodS;
  const savG = spectrum.psaG(periodS);
  return {
    periodS,
    rigid: v.periodS === 'rigid',
    cv: spectrum.parameters['cv'] as number,
    savG,
    forceKN: savG * equipment.weightKN,
    description: spectrum.description,
  };
}

const n = (value: number) => formatNumber(value);

/** The code force's statements for the assumptions of every output, in the words of its edition. */
export function componentForceStatements(equipment: Equipment, code: ComponentForce): string[] {
  if (code.edition === 'asce7-16') {
    return [
      'Code force: ASCE/SEI 7-16 §13.3.1, F_p = 0.4 a_p S_DS W_p (1 + 2z/h)/(R_p/I_p), bounded by ' +
        '0.3 S_DS I_p W_p and 1.6 S_DS I_p W_p; a_p, R_p, I_p and S_DS are as given in the equipment file ' +
        '(not chosen by this tool from the standard).',
    ];
  }
  const { heightFactor: hf, ductility } = code;
  const lines = [
    'Code force: ASCE/SEI 7-22 §13.3.1, F_p = 0.4 S_DS I_p W_p (H_f/R_μ)(C_AR/R_po) (Eq. 13.3-1), bounded by ' +
      '0.3 S_DS I_p W_p (Eq. 13.3-3) and 1.6 S_DS I_p W_p (Eq. 13.3-2); C_AR, R_po, I_p and S_DS are as given in ' +
      'the equipment file (not chosen by this tool from the standard’s tables).',
  ];
  const building = equipment.factors.code === 'asce7-22' ? equipment.factors.building : null;
  if (code.atGrade) {
    const given = [...BUILDING_KEYS, BUILDING_PERIOD_KEY].filter((key) => equipment.input[key] !== undefined);
    lines.push(
      'At or below grade (z = 0): H_f = 1 (§13.3.1.1) and R_μ = 1 (§13.3.1.2).' +
        (given.length > 0 ? ` The building’s ${given.join(', ')} given in the file are not used.` : ''),
    );
  } else if (hf.equation === 'Eq. 13.3-5') {
    lines.push(
      `H_f = 1 + 2.5(z/h) = ${n(hf.hf)} (§13.3.1.1, Eq. 13.3-5): the building’s approximate period T_a was not given ("building_ta_s").`,
    );
  } else {
    lines.push(
      `H_f = 1 + a₁(z/h) + a₂(z/h)¹⁰ = ${n(hf.hf)} (§13.3.1.1, Eq. 13.3-4) with T_a = ${building?.taS} s: ` +
        `a₁ = 1/T_a${hf.a1Capped ? ' capped at 2.5' : ''} = ${n(hf.a1 as number)}, ` +
        `a₂ = 1 − (0.4/T_a)²${hf.a2Floored ? ' floored at 0' : ''} = ${n(hf.a2 as number)}.`,
    );
  }
  if (!code.atGrade && building !== null) {
    lines.push(
      `R_μ = (1.1 R/(I_e Ω₀))^½ = (1.1·${building.r}/(${building.ie}·${building.omega0}))^½ = ${n(ductility.formula as number)}` +
        `${ductility.floored ? ', below 1.3, so R_μ = 1.3' : ''} (§13.3.1.2, Eq. 13.3-6), from the building’s R, Ω₀ and I_e as given ` +
        '(the building’s Ω₀, not the anchorage’s "omega0").',
    );
  }
  lines.push(
    // Clause numbers here are from memory (docs/methods-and-verification.md); outputs name them plainly.
    'Not used: the alternative floor accelerations of ASCE/SEI 7-22 §13.3.1.3 and §13.3.1.4 (from a modal ' +
      'or a nonlinear response-history analysis of the building) and the requirements for particular components.',
  );
  return lines;
}

/** The vertical statements: E_v (both editions) and the vertical spectral demand where given. */
export function verticalStatements(
  equipment: Equipment,
  deadLoadFactor: number,
  spectral: VerticalSpectralDemand | null,
): string[] {
  const lines =
    equipment.code === 'asce7-16'
      ? [
          'Vertical: E_v = 0.2 S_DS W_p (§13.3.1.2); in the anchor tension it enters through the dead load ' +
            `(0.9 − 0.2 S_DS) W_p = ${deadLoadFactor.toFixed(3)} W_p of ASCE/SEI 7-16 §2.3.6, which counteracts uplift.`,
        ]
      : [
          'Vertical: E_v = 0.2 S_DS W_p, the concurrent vertical force of ASCE/SEI 7-22 §13.3.1 with §12.4.2.2; ' +
            `in the anchor tension it enters through the dead load (0.9 − 0.2 S_DS) W_p = ${deadLoadFactor.toFixed(3)} W_p ` +
            'of the load combinations (§2.3.6), which counteracts uplift.',
        ];
  if (spectral !== null) {
    const period = spectral.rigid ? 'T_v = 0 (rigid vertically)' : `T_v = ${spectral.periodS} s`;
    lines.push(
      `Vertical spectral demand, for information only: S_av(T_v)·W_p with S_av = ${n(spectral.savG)} g at ${period} ` +
        `from the ${EDITION_NAMES[equipment.code]} §11.9 design vertical spectrum (C_v = ${n(spectral.cv)}, Table 11.9-1). ` +
        'It governs nothing here: the anchor forces and the load combinations use E_v = 0.2 S_DS W_p. From memory, ' +
        '§12.4.2.2 takes E_v = 0.3 S_av D for structures where §11.9 is required elsewhere; whether it applies to this ' +
        'component is the engineer’s call. S_S and the site class are as given; their agreement with S_DS is not checked.',
    );
  }
  return lines;
}
