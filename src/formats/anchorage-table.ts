import { ANCHORAGE_SCOPE, type AnchorageAnalysis } from '../anchorage/anchorage.js';
import { EQUIPMENT_UNITS } from '../anchorage/equipment.js';
import { cautionLines } from '../base/caution.js';
import { wrapText } from './wrap.js';

/** The terminal report: the caution first, then scope, forces, anchors and assumptions. */
export function anchorTable(analysis: AnchorageAnalysis): string {
  const e = analysis.equipment;
  const system = EQUIPMENT_UNITS[e.units];
  const f = (kN: number) => (kN / system.kNPerForce).toPrecision(4);
  const l = (m: number) => Number((m / system.mPerLength).toPrecision(4)).toString();
  const unit = system.force;
  const out: string[] = [];
  for (const line of cautionLines(92)) out.push(`! ${line}`);
  out.push('');
  out.push(...wrapText(ANCHORAGE_SCOPE, 92, 'scope     ', '          '));
  out.push('');
  out.push(`equipment ${e.name} (${e.units}: ${unit}, ${system.length})`);
  out.push(
    `          W_p ${f(e.weightKN)} ${unit}, h_cg ${l(e.cgHeightM)} ${system.length}, ${e.anchorsM.length} anchors, ` +
      `T ${e.periodS === 'rigid' ? 'rigid' : `${e.periodS} s`}, ζ ${e.damping}, z ${l(e.zM)} / h ${l(e.hM)} ${system.length}`,
  );
  out.push(`          a_p ${e.ap}, R_p ${e.rp}, I_p ${e.ip}, S_DS ${e.sds} g, Ω₀ ${e.omega0 ?? 'not given'}`);
  out.push('');
  const c = analysis.code;
  out.push('horizontal');
  out.push(
    `  F_p code (ASCE 7-16 Eq. 13.3-1)   ${f(c.fpFormula).padStart(10)} ${unit}   bounds ${f(c.fpMin)} to ${f(c.fpMax)} ${unit}`,
  );
  out.push(
    `  F_p code, bounded                ${f(c.fp).padStart(10)} ${unit}   (${c.bound}; z/h = ${c.heightRatio.toFixed(3)})`,
  );
  if (e.omega0 !== null)
    out.push(`  Ω₀·F_p                           ${f(analysis.codeForAnchorsKN).padStart(10)} ${unit}`);
  if (analysis.elasticKN !== null && analysis.elastic !== null) {
    out.push(
      `  record elastic PSA·W_p           ${f(analysis.elasticKN).padStart(10)} ${unit}   (PSA ${analysis.elastic.psaG.toPrecision(4)} g)`,
    );
  } else {
    out.push('  record elastic PSA·W_p                  —      (no ground motion used)');
  }
  out.push(
    `  for the anchors (--demand ${analysis.demand})   ${f(analysis.horizontalForAnchorsKN).padStart(10)} ${unit}   governing: ${analysis.governing}`,
  );
  out.push(`vertical  E_v = ±0.2 S_DS W_p = ${f(analysis.verticalKN)} ${unit}`);
  out.push('');
  const a = analysis.anchors;
  out.push(
    `anchors (rule ${a.rule}${a.rule === 'projected' ? '; --anchor-rule biaxial for the general elastic solution' : '; --anchor-rule projected, the default, is more conservative'})`,
  );
  out.push('  worst over every direction of shaking; direction of the force, ° counter-clockwise from +x');
  out.push(
    `  ${'#'.padStart(3)} ${`x ${system.length}`.padStart(9)} ${`y ${system.length}`.padStart(9)} ${`tension ${unit}`.padStart(13)} ${'at °'.padStart(7)} ${`shear ${unit}`.padStart(11)} ${'at °'.padStart(7)}`,
  );
  a.perAnchor.forEach((p, i) => {
    out.push(
      `  ${String(i + 1).padStart(3)} ${l(p.x).padStart(9)} ${l(p.y).padStart(9)} ${f(p.tension).padStart(13)} ${p.tensionDirectionDeg.toFixed(1).padStart(7)} ${f(p.shear).padStart(11)} ${p.shearDirectionDeg.toFixed(1).padStart(7)}${i === a.governingAnchor ? '  governs' : ''}`,
    );
  });
  out.push(
    `  max tension ${f(a.maxTension)} ${unit} at ${a.maxTensionDirectionDeg.toFixed(1)}° (anchor ${a.governingAnchor + 1}); max shear ${f(a.maxShear)} ${unit}`,
  );
  if (a.maxTension === 0)
    out.push('  no anchor goes into tension: the counteracting dead load exceeds the overturning.');
  out.push('');
  out.push('method and assumptions');
  for (const line of analysis.assumptions) out.push(...wrapText(line, 92, '  - ', '    '));
  return `${out.join('\n')}\n`;
}
