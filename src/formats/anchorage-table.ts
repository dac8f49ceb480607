import { ANCHORAGE_SCOPE, type AnchorageAnalysis } from '../anchorage/anchorage.js';
import { EQUIPMENT_UNITS } from '../anchorage/equipment.js';
import { wrapText } from '../base/caution.js';
import { formatNumber, formatSignificant } from '../base/numbers.js';
import { alignRight, assumptionLines, terminalText } from './layout.js';

/** The terminal report: the caution first, then scope, forces, anchors and assumptions. */
export function anchorTable(analysis: AnchorageAnalysis): string {
  const e = analysis.equipment;
  const system = EQUIPMENT_UNITS[e.units];
  const f = (kN: number) => formatSignificant(kN / system.kNPerForce);
  const l = (m: number) => formatNumber(m / system.mPerLength);
  const unit = system.force;
  const out = wrapText(ANCHORAGE_SCOPE, 92, 'scope     ', '          ');
  out.push('', `equipment ${e.name} (${e.units}: ${unit}, ${system.length})`);
  out.push(
    `          W_p ${f(e.weightKN)} ${unit}, h_cg ${l(e.cgHeightM)} ${system.length}, ${e.anchorsM.length} anchors, ` +
      `T ${e.periodS === 'rigid' ? 'rigid' : `${e.periodS} s`}, ζ ${e.damping}, z ${l(e.zM)} / h ${l(e.hM)} ${system.length}`,
  );
  const { code: c, elastic, elasticKN, governing } = analysis;
  const force = (label: string, kN: number, note = '') =>
    `  ${label.padEnd(30)}   ${f(kN).padStart(10)} ${unit}${note && `   ${note}`}`;
  if (c.edition === 'asce7-16' && e.factors.code === 'asce7-16') {
    out.push(
      `          a_p ${e.factors.ap}, R_p ${e.factors.rp}, I_p ${e.ip}, S_DS ${e.sds} g, Ω₀ ${e.omega0 ?? 'not given'}`,
    );
    out.push(
      '',
      'horizontal',
      force('F_p (ASCE 7-16 Eq. 13.3-1)', c.fpFormula, `bounds ${f(c.fpMin)} to ${f(c.fpMax)} ${unit}`),
      force('F_p code, bounded', c.fp, `(${c.bound}; z/h = ${c.heightRatio.toFixed(3)})`),
    );
  } else out.push(...asce722Lines(analysis, force));
  if (e.omega0 !== null) out.push(force('Ω₀·F_p', analysis.codeForAnchorsKN));
  out.push(
    elasticKN !== null && elastic !== null
      ? force('record elastic PSA·W_p', elasticKN, `(PSA ${formatSignificant(elastic.psaG)} g)`)
      : '  record elastic PSA·W_p                  —      (no ground motion used)',
    force(
      `for the anchors (--demand ${analysis.demand})`,
      analysis.horizontalForAnchorsKN,
      `governing: ${governing}`,
    ),
  );
  out.push(
    `vertical  E_v = ±0.2 S_DS W_p = ${f(analysis.verticalKN)} ${unit}${e.code === 'asce7-22' ? '   (ASCE/SEI 7-22 §13.3.1, §12.4.2.2)' : ''}`,
  );
  const v = analysis.verticalSpectral;
  if (v !== null) {
    out.push(
      `          S_av(T_v)·W_p = ${f(v.forceKN)} ${unit}   (§11.9: S_av ${formatSignificant(v.savG)} g at T_v ${v.periodS} s, C_v ${formatNumber(v.cv)}; information only, governs nothing)`,
    );
  }
  const a = analysis.anchors;
  out.push(
    '',
    `anchors (rule ${a.rule}${a.rule === 'projected' ? '; --anchor-rule biaxial for the general elastic solution' : '; --anchor-rule projected, the default, is more conservative'})`,
    '  worst over every direction of shaking; direction of the force, ° counter-clockwise from +x',
  );
  const widths = [3, 9, 9, 13, 7, 11, 7];
  const length = system.length;
  out.push(
    `  ${alignRight(['#', `x ${length}`, `y ${length}`, `tension ${unit}`, 'at °', `shear ${unit}`, 'at °'], widths)}`,
  );
  a.perAnchor.forEach((p, i) => {
    const forces = [
      f(p.tension),
      p.tensionDirectionDeg.toFixed(1),
      f(p.shear),
      p.shearDirectionDeg.toFixed(1),
    ];
    out.push(
      `  ${alignRight([String(i + 1), l(p.x), l(p.y), ...forces], widths)}${i === a.governingAnchor ? '  governs' : ''}`,
    );
  });
  out.push(
    `  max tension ${f(a.maxTension)} ${unit} at ${a.maxTensionDirectionDeg.toFixed(1)}° (anchor ${a.governingAnchor + 1}); max shear ${f(a.maxShear)} ${unit}`,
  );
  if (a.maxTension === 0)
    out.push('  no anchor goes into tension: the counteracting dead load exceeds the overturning.');
  out.push(...assumptionLines(analysis.assumptions));
  return terminalText(out);
}

/** The 7-22 inputs and the force's terms, each with its clause. */
function asce722Lines(
  analysis: AnchorageAnalysis,
  force: (label: string, kN: number, note?: string) => string,
) {
  const e = analysis.equipment;
  const c = analysis.code;
  const f = e.factors;
  if (c.edition !== 'asce7-22' || f.code !== 'asce7-22') return [];
  const unit = EQUIPMENT_UNITS[e.units].force;
  const v = (kN: number) => formatSignificant(kN / EQUIPMENT_UNITS[e.units].kNPerForce);
  const b = f.building;
  const r = (x: number | null) => (x === null ? '—' : formatNumber(x));
  const hf = c.heightFactor;
  const building =
    b === null
      ? 'building not given (at grade)'
      : `building R ${b.r}, Ω₀ ${b.omega0}, I_e ${b.ie}, T_a ${b.taS === null ? 'not given' : `${b.taS} s`}${c.atGrade ? ' (not used at grade)' : ''}`;
  const hfNote = c.atGrade
    ? 'at or below grade (§13.3.1.1)'
    : hf.equation === 'Eq. 13.3-4'
      ? `§13.3.1.1 Eq. 13.3-4: a₁ ${r(hf.a1)}${hf.a1Capped ? ' (cap 2.5)' : ''}, a₂ ${r(hf.a2)}${hf.a2Floored ? ' (floor 0)' : ''}`
      : '§13.3.1.1 Eq. 13.3-5 (T_a not given)';
  const rmuNote = c.atGrade
    ? 'at or below grade (§13.3.1.2)'
    : `§13.3.1.2 Eq. 13.3-6: (1.1 R/(I_e Ω₀))^½ = ${r(c.ductility.formula)}${c.ductility.floored ? ', floor 1.3' : ''}`;
  return [
    `          ASCE/SEI 7-22: C_AR ${f.car}, R_po ${f.rpo}, I_p ${e.ip}, S_DS ${e.sds} g, Ω₀ (anchorage) ${e.omega0 ?? 'not given'}`,
    `          ${building}`,
    '',
    'horizontal (ASCE/SEI 7-22 §13.3.1)',
    `  ${'H_f'.padEnd(30)}   ${r(hf.hf).padStart(10)}      ${hfNote}`,
    `  ${'R_μ'.padEnd(30)}   ${r(c.ductility.rmu).padStart(10)}      ${rmuNote}`,
    force('F_p (ASCE 7-22 Eq. 13.3-1)', c.fpFormula, '0.4 S_DS I_p W_p (H_f/R_μ)(C_AR/R_po)'),
    `  ${''.padEnd(30)}   ${''.padStart(10)}      bounds ${v(c.fpMin)} (Eq. 13.3-3) to ${v(c.fpMax)} ${unit} (Eq. 13.3-2)`,
    force('F_p code, bounded', c.fp, `(${c.bound}; z/h = ${c.heightRatio.toFixed(3)})`),
  ];
}
