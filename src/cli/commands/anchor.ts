import { readFileSync } from 'node:fs';
import type { Command } from 'commander';
import {
  ANCHORAGE_SCOPE,
  type AnchorageAnalysis,
  analyseAnchorage,
  type ElasticInput,
  parseDemandChoice,
} from '../../anchorage/anchorage.js';
import { parseAnchorRule } from '../../anchorage/bolt-group.js';
import { psaAtPeriod, recordPsaForComponent } from '../../anchorage/elastic-demand.js';
import { centroid, EQUIPMENT_UNITS, type Equipment, parseEquipment } from '../../anchorage/equipment.js';
import { cautionLines } from '../../base/caution.js';
import { inputError, usageError } from '../../base/errors.js';
import { anchorageToJson } from '../../formats/anchorage-json.js';
import { formatJson } from '../../formats/spectrum-json.js';
import { parseMethod } from '../../oscillator/recurrence.js';
import { OutputSet } from '../../output/output-set.js';
import { anchorPlanSvg } from '../../plot/anchor-plan.js';
import { addRecordOptions, loadRecord, type RecordCliOptions } from '../record-options.js';

export interface AnchorCliOptions extends RecordCliOptions {
  equipment?: string;
  record: string[];
  spectrum?: string;
  demand?: string;
  method?: string;
  format?: string;
  out?: string;
  svg?: string;
  anchorRule?: string;
}

const collect = (value: string, previous: string[]) => [...previous, value];

export function registerAnchor(program: Command): void {
  const command = program
    .command('anchor')
    .description(
      'preliminary anchor demands (tension, shear) of rigidly based equipment: ASCE 7-16 §13.3.1 force and/or a record’s elastic demand',
    )
    .option('--equipment <file>', 'equipment description (JSON; see the README)')
    .option(
      '--record <file>',
      'ground record for the elastic demand (repeatable: the largest governs)',
      collect,
      [],
    )
    .option(
      '--spectrum <file>',
      'spectrum JSON from `quakesweep spectrum --format json` or `quakesweep floor`',
    )
    .option(
      '--demand <choice>',
      'horizontal force for the anchors: code, record or max (default: max with a motion, else code)',
    )
    .option('--method <method>', 'oscillator step method for --record', 'newmark-average')
    .option(
      '--anchor-rule <rule>',
      'overturning share: projected (M·d_i/Σd², neutral axis perpendicular to the shaking) or biaxial (general elastic)',
      'projected',
    );
  addRecordOptions(command);
  command
    .option('--format <format>', 'json or table (default: table on the terminal, json with --out)')
    .option('--out <path>', 'write to this file instead of standard output')
    .option('--svg <dir>', 'also write the anchor plan view, DIR/anchor-plan.svg')
    .action(async (options: AnchorCliOptions) => {
      await runAnchor(options);
    });
}

export async function runAnchor(options: AnchorCliOptions): Promise<void> {
  if (options.equipment === undefined) throw usageError('--equipment <file> is required');
  const format = options.format ?? (options.out === undefined ? 'table' : 'json');
  if (!['json', 'table'].includes(format)) throw usageError(`--format '${format}': use json or table`);
  const records = options.record ?? [];
  if (records.length > 0 && options.spectrum !== undefined) {
    throw usageError('give --record or --spectrum, not both');
  }
  const hasMotion = records.length > 0 || options.spectrum !== undefined;
  const demand = parseDemandChoice(options.demand ?? (hasMotion ? 'max' : 'code'));
  const method = parseMethod(options.method ?? 'newmark-average');
  const anchorRule = parseAnchorRule(options.anchorRule ?? 'projected');

  const equipment = parseEquipment(readFileSync(options.equipment, 'utf8'), options.equipment);
  const notes: string[] = [];
  let elastic: ElasticInput | null = null;
  if (options.spectrum !== undefined) {
    const read = readSpectrumFile(options.spectrum, equipment);
    if (equipment.zM > 0 && !read.isFloor) {
      refuseGroundOnFloor(equipment, demand, notes);
    } else {
      elastic = read.value;
      if (read.isFloor) notes.push(read.floorNote);
    }
  } else if (records.length > 0) {
    if (equipment.zM > 0) {
      refuseGroundOnFloor(equipment, demand, notes);
    } else {
      for (const source of records) {
        const record = await loadRecord(source, options);
        const value = recordPsaForComponent(record, equipment.periodS, equipment.damping, method);
        if (elastic === null || value.psaG > elastic.psaG) elastic = { ...value, source };
      }
      if (records.length > 1 && elastic !== null) {
        notes.push(`Record demand: the largest of ${records.length} records (${records.join(', ')}).`);
      }
    }
  }

  const analysis = analyseAnchorage(equipment, { elastic, demand, anchorRule });
  analysis.assumptions.push(...notes);
  const text = format === 'json' ? formatJson(anchorageToJson(analysis)) : anchorTable(analysis);
  const inputs = [options.equipment, ...records, ...(options.spectrum ? [options.spectrum] : [])];
  const outputs = new OutputSet(inputs);
  if (options.svg !== undefined)
    outputs.folder(options.svg, [['anchor-plan.svg', anchorPlanSvg(planInput(analysis))]], '--svg');
  outputs.text(options.out, text).write();
}

function refuseGroundOnFloor(equipment: Equipment, demand: string, notes: string[]): void {
  const length = EQUIPMENT_UNITS[equipment.units].length;
  const z = equipment.zM / EQUIPMENT_UNITS[equipment.units].mPerLength;
  if (demand !== 'code') {
    throw usageError(
      `the equipment is attached at z = ${z} ${length} above the base, so a ground motion does not describe its floor; ` +
        'make a floor spectrum with `quakesweep floor REC ... --format json --out floor.json` and give --spectrum floor.json, ' +
        'or use --demand code',
    );
  }
  notes.push(
    'The ground motion given was not used: the equipment is above the base and no floor spectrum was given.',
  );
}

interface SpectrumFileValue {
  value: ElasticInput;
  isFloor: boolean;
  floorNote: string;
}

/** Read the component's PSA from a spectrum JSON file, checking the fields it needs. */
export function readSpectrumFile(file: string, equipment: Equipment): SpectrumFileValue {
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

export function planInput(analysis: AnchorageAnalysis) {
  const e = analysis.equipment;
  const system = EQUIPMENT_UNITS[e.units];
  const l = (m: number) => m / system.mPerLength;
  const a = analysis.anchors;
  return {
    title: `${e.name}: anchor plan and worst tensions`,
    forceUnit: system.force,
    lengthUnit: system.length,
    anchors: a.perAnchor.map((p) => ({ x: l(p.x), y: l(p.y), tension: p.tension / system.kNPerForce })),
    governingAnchor: a.governingAnchor,
    directionDeg: a.maxTensionDirectionDeg,
    cgPlan: [l(e.cgPlanM[0]), l(e.cgPlanM[1])] as [number, number],
    centroid: centroid(e.anchorsM).map(l) as [number, number],
    subtitle: [
      `Horizontal force for the anchors ${(analysis.horizontalForAnchorsKN / system.kNPerForce).toPrecision(4)} ${system.force} ` +
        `(${analysis.governing === 'code' ? 'ASCE 7-16 §13.3.1 code force' : 'record elastic demand'}) at h_cg = ${Number(l(e.cgHeightM).toPrecision(4))} ${system.length}; W_p = ${(e.weightKN / system.kNPerForce).toPrecision(4)} ${system.force}`,
      `Method: rigid base, elastic bolt group, anchor rule ${a.rule}${a.rule === 'projected' ? ' (T_i = M·d_i/Σd_j² − D/n, neutral axis perpendicular to the shaking)' : ' (general elastic solution, moment equilibrium about both plan axes)'}`,
    ],
    notes: [
      'Each anchor shows its own worst tension over every direction of shaking (0–360°), not the tensions of one direction; the arrow is the direction of the horizontal force on the equipment that gives the governing anchor its worst tension, degrees counter-clockwise from +x.',
      'Demands only: anchor capacities (steel, concrete breakout, pull-out, edge distances, embedment) are not checked.',
    ],
  };
}

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

/** Wrap a paragraph at `width` columns, the first line after `first`, the others after `rest`. */
export function wrapText(text: string, width: number, first: string, rest: string): string[] {
  const lines: string[] = [];
  let line = first;
  let fresh = true;
  for (const word of text.split(' ')) {
    if (!fresh && line.length + 1 + word.length > width) {
      lines.push(line);
      line = rest + word;
    } else {
      line = fresh ? line + word : `${line} ${word}`;
    }
    fresh = false;
  }
  lines.push(line);
  return lines;
}
