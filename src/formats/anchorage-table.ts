import { ANCHORAGE_SCOPE, type AnchorageAnalysis } from '../anchorage/anchorage.js';
import { EQUIPMENT_UNITS } from '../anchorage/equipment.js';
import { wrapText } from '../base/caution.js';
import { alignRight, assumptionLines, terminalText } from './layout.js';

/** The terminal report: the caution first, then scope, forces, anchors and assumptions. */
export function anchorTable(analysis: AnchorageAnalysis): string {
  const e = analysis.equipment;
  const system = EQUIPMENT_UNITS[e.units];
  const f = (kN: number) => (kN / system.kNPerForce).toPrecision(4);
  const l = (m: number) => Number((m / system.mPerLength).toPrecision(4)).toString();
  const unit = system.force;
  const out = wrapText(ANCHORAGE_SCOPE, 92, 'scope     ', '          ');
  out.push('', `equipment ${e.name} (${e.units}: ${unit}, ${system.length})`);
  out.push(
    `          W_p ${f(e.weightKN)} ${unit}, h_cg ${l(e.cgHeightM)} ${system.length}, ${e.anchorsM.length} anchors, ` +
      `T ${e.periodS === 'rigid' ? 'rigid' : `${e.periodS} s`}, ζ ${e.damping}, z ${l(e.zM)} / h ${l(e.hM)} ${system.length}`,
  );
  out.push(`          a_p ${e.ap}, R_p ${e.rp}, I_p ${e.ip}, S_DS ${e.sds} g, Ω₀ ${e.omega0 ?? 'not given'}`);
  const { code: c, elastic, elasticKN, governing } = analysis;
  const force = (label: string, kN: number, note = '') =>
    `  ${label.padEnd(30)}   ${f(kN).padStart(10)} ${unit}${note && `   ${note}`}`;
  out.push(
    '',
    'horizontal',
    force('F_p code (ASCE 7-16 Eq. 13.3-1)', c.fpFormula, `bounds ${f(c.fpMin)} to ${f(c.fpMax)} ${unit}`),
    force('F_p code, bounded', c.fp, `(${c.bound}; z/h = ${c.heightRatio.toFixed(3)})`),
  );
  if (e.omega0 !== null) out.push(force('Ω₀·F_p', analysis.codeForAnchorsKN));
  out.push(
    elasticKN !== null && elastic !== null
      ? force('record elastic PSA·W_p', elasticKN, `(PSA ${elastic.psaG.toPrecision(4)} g)`)
      : '  record elastic PSA·W_p                  —      (no ground motion used)',
    force(
      `for the anchors (--demand ${analysis.demand})`,
      analysis.horizontalForAnchorsKN,
      `governing: ${governing}`,
    ),
  );
  out.push(`vertical  E_v = ±0.2 S_DS W_p = ${f(analysis.verticalKN)} ${unit}`);
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
