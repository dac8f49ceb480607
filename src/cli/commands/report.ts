import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Command } from 'commander';
import { type AnchorageAnalysis, analyseAnchorage, type ElasticInput } from '../../anchorage/anchorage.js';
import { psaAtPeriod, recordPsaForComponent } from '../../anchorage/elastic-demand.js';
import { type Equipment, parseEquipment } from '../../anchorage/equipment.js';
import { usageError } from '../../base/errors.js';
import { parseLengthUnit, STANDARD_GRAVITY_MS2 } from '../../base/units.js';
import { VERSION } from '../../base/version.js';
import { anchorageToJson } from '../../formats/anchorage-json.js';
import { anchorPlanInput } from '../../formats/anchorage-plan.js';
import { floorAssumptions } from '../../formats/floor.js';
import { INFO_METHODS } from '../../formats/info.js';
import { spectrumToCsv } from '../../formats/spectrum-csv.js';
import { formatJson, spectrumToJson } from '../../formats/spectrum-json.js';
import { targetToJson } from '../../formats/target.js';
import { METHOD_DESCRIPTIONS, type Method } from '../../oscillator/recurrence.js';
import { checkFolder, OutputSet } from '../../output/output-set.js';
import {
  anchorPlanSvg,
  dampingFigure,
  historiesFigure,
  psaFigure,
  psvFigure,
  rotdFigure,
  sdFigure,
  tripartiteFigure,
} from '../../plot/index.js';
import { integrateRecord } from '../../record/integrate.js';
import { groundMotionMeasures } from '../../record/measures.js';
import type { GroundRecord } from '../../record/record.js';
import { type ReportFigure, type ReportInput, renderReport } from '../../report/report.js';
import { compareDamping } from '../../spectrum/damping.js';
import { type BuildingMode, floorSpectrum } from '../../spectrum/floor.js';
import { rotDSpectraParallel } from '../../spectrum/rotd.js';
import { responseSpectrum } from '../../spectrum/spectrum.js';
import { targetOverlay, targetRecord } from '../../spectrum/target.js';
import { addProcessingOptions, applyProcessing } from '../processing-options.js';
import { addRecordOptions, loadRecord, positiveNumber } from '../record-options.js';
import { addTargetOptions, applyTarget, loadTarget } from '../target-options.js';
import { broadeningFromOptions, buildingFromOptions } from './floor.js';
import { rotdThreads } from './rotd.js';
import { addGridOptions, gridFromOptions, type SpectrumCliOptions } from './spectrum.js';

export interface ReportCliOptions extends SpectrumCliOptions {
  equipment?: string[];
  buildingPeriod?: string;
  buildingDamping?: string;
  modalFactor?: string;
  broaden?: string | boolean;
  pair?: string;
  angleStep?: string;
  title?: string;
  note?: string[];
}

const collect = (value: string, previous: string[]) => [...previous, value];

export function registerReport(program: Command): void {
  const command = program
    .command('report')
    .description('a self-contained HTML calculation report (with spectra.json, spectra.csv and SVG figures)')
    .argument('<record>', 'record file');
  addRecordOptions(command);
  addProcessingOptions(command);
  addGridOptions(command);
  addTargetOptions(command);
  command
    .requiredOption(
      '--out <dir>',
      'folder for report.html and the files beside it (created if its parent exists)',
    )
    .option(
      '--note <text>',
      'a paragraph under the title, e.g. where the inputs come from (repeatable)',
      collect,
      [],
    )
    .option('--title <text>', 'title of the report (default: "Response spectra of <record name>")')
    .option('--length-unit <unit>', 'length unit of SD and PSV in tables and figures: m, cm, mm, in, ft', 'm')
    .option('--axes <axes>', 'axes of the PSA, SD and PSV figures: log or linear', 'log')
    .option('--pair <record>', 'second horizontal component, at right angles: adds RotD50 and RotD100')
    .option('--angle-step <degrees>', 'with --pair: rotation step, at most 1° and a divisor of 180', '1')
    .option(
      '--equipment <file>',
      'equipment description (JSON) for anchorage demands (repeatable)',
      collect,
      [],
    )
    .option('--building-period <seconds>', 'for equipment above the base: the building period T_b, s')
    .option('--building-damping <ratio>', "for equipment above the base: the building's modal damping", '5%')
    .option('--modal-factor <value>', 'for equipment above the base: Γφ at its floor')
    .option('--broaden [fraction]', 'broaden the floor spectrum peaks, b = 0.15 unless given')
    .action(async (source: string, options: ReportCliOptions, cmd: Command) => {
      const words =
        (cmd.parent as unknown as { rawArgs?: string[] } | null)?.rawArgs ?? process.argv.slice(2);
      await runReport(source, options, words);
    });
}

export async function runReport(
  source: string,
  options: ReportCliOptions,
  commandLine: string[],
): Promise<string> {
  const out = options.out;
  if (out === undefined) throw usageError('--out <dir> is required');
  const grid = gridFromOptions(options);
  const lengthUnit = parseLengthUnit(options.lengthUnit ?? 'm');
  const axes = options.axes ?? 'log';
  if (axes !== 'log' && axes !== 'linear') throw usageError(`--axes '${axes}': use log or linear`);
  const target = loadTarget(options);
  const equipment = (options.equipment ?? []).map((file) => ({
    file,
    value: parseEquipment(readFileSync(file, 'utf8'), file),
  }));
  const building = needsBuilding(
    equipment.map((e) => e.value),
    options,
  );
  const broadeningFraction = broadeningFromOptions(options.broaden);
  checkFolder({ path: out, option: '--out' });

  const raw = await loadRecord(source, options);
  const processed = applyProcessing(raw, options);
  const { fit, spectrum } = applyTarget(responseSpectrum(processed, grid), target, options);
  const record = targetRecord(processed, fit);
  const inputs = [source, ...(options.pair ? [options.pair] : []), ...equipment.map((e) => e.file)];
  const files = new Map<string, string>();
  files.set('spectra.json', formatJson({ ...spectrumToJson(spectrum), ...(fit && targetToJson(fit)) }));
  files.set('spectra.csv', spectrumToCsv(spectrum, { lengthUnit, target: fit }));

  const shared = {
    axes: axes as 'log' | 'linear',
    lengthUnit,
    methodDescription: METHOD_DESCRIPTIONS[spectrum.method],
    overlays: fit === undefined ? [] : [targetOverlay(spectrum.periodsS, fit)],
  };
  const spectrumFigures: ReportFigure[] = [
    { file: 'psa.svg', caption: 'Pseudo-acceleration spectra PSA', svg: psaFigure(spectrum, shared) },
    { file: 'sd.svg', caption: 'Relative displacement spectra SD', svg: sdFigure(spectrum, shared) },
    { file: 'psv.svg', caption: 'Pseudo-velocity spectra PSV', svg: psvFigure(spectrum, shared) },
    {
      file: 'tripartite.svg',
      caption: 'Four-way (tripartite) plot of the same spectra',
      svg: tripartiteFigure(spectrum, shared),
    },
    {
      file: 'histories.svg',
      caption: 'Ground acceleration, velocity and displacement of the processed record',
      svg: historiesFigure({ ...record, ...integrateRecord(record) }, { lengthUnit }),
    },
  ];
  const input: ReportInput = {
    title: options.title ?? `Response spectra of ${record.name}`,
    notes: options.note ?? [],
    read: {
      name: raw.name,
      source: raw.source,
      dtS: raw.dtS,
      npts: raw.accelMS2.length,
      unitsRead: raw.unitsRead,
    },
    spectrum,
    measures: groundMotionMeasures(record),
    lengthUnit,
    spectrumFigures,
    target: fit,
    anchorage: [],
    methods: methodStatements(spectrum.method),
    version: VERSION,
    commandLine,
    workingDirectory: process.cwd(),
    generatedAt: generationTime(),
    files: [],
  };
  if (spectrum.curves.length > 1 && spectrum.curves.some((c) => Math.abs(c.damping - 0.05) < 1e-12)) {
    const comparison = compareDamping(spectrum);
    input.damping = {
      comparison,
      figure: {
        file: 'damping.svg',
        caption: 'PSA at each damping ratio relative to 5%',
        svg: dampingFigure({
          record: spectrum.record,
          methodDescription: METHOD_DESCRIPTIONS[spectrum.method],
          comparison,
        }),
      },
    };
  }
  if (options.pair !== undefined) {
    // --name names the main record only; the second component keeps its file's name.
    const second = applyProcessing(await loadRecord(options.pair, { ...options, name: undefined }), options);
    const angleStepDeg = positiveNumber('--angle-step', options.angleStep ?? '1');
    // One damping ratio (5% where the grid has it): the rotation sweep costs about 180 single sweeps.
    const damping = grid.dampings.find((d) => Math.abs(d - 0.05) < 1e-12) ?? grid.dampings[0];
    const samples = Math.max(processed.accelMS2.length, second.accelMS2.length);
    const spectra = await rotDSpectraParallel(processed, second, {
      ...grid,
      dampings: [damping],
      angleStepDeg,
      threads: rotdThreads(grid.periodsS.length, 1, samples),
    });
    input.rotd = {
      spectra,
      figure: {
        file: 'rotd.svg',
        caption: 'RotD50, RotD100 and geometric mean',
        svg: rotdFigure({ spectra, methodDescription: METHOD_DESCRIPTIONS[spectra.method] }),
      },
    };
    input.methods.push(
      `RotD spectra: at ζ = ${damping * 100}% only; both components processed alike and unscaled (a target scaling is not applied to them).`,
    );
  }
  equipment.forEach(({ file, value }, i) => {
    const n = i + 1;
    const demand = equipmentDemand(value, record, building, broadeningFraction, grid.periodsS, grid.method);
    const analysis: AnchorageAnalysis = analyseAnchorage(value, {
      elastic: demand.elastic,
      demand: demand.elastic === null ? 'code' : 'max',
    });
    analysis.assumptions.push(...demand.notes);
    const figures: ReportFigure[] = [
      {
        file: `anchor-plan-${n}.svg`,
        caption: `Anchor plan of equipment ${n} with the worst tensions`,
        svg: anchorPlanSvg(anchorPlanInput(analysis)),
      },
    ];
    if (demand.floor !== undefined) {
      figures.unshift({
        file: `floor-${n}.svg`,
        caption: `Floor spectrum for equipment ${n}, with the ground PSA`,
        svg: demand.floor,
      });
    }
    const json = anchorageToJson(analysis);
    files.set(`anchorage-${n}.json`, formatJson(json));
    input.anchorage.push({ item: { json, file, motion: demand.motion }, figures });
  });

  const figures = [
    ...spectrumFigures,
    ...(input.damping ? [input.damping.figure] : []),
    ...(input.rotd ? [input.rotd.figure] : []),
    ...input.anchorage.flatMap((a) => a.figures),
  ];
  for (const f of figures) files.set(f.file, f.svg);
  input.files = [...files.keys()];
  files.set('report.html', renderReport(input));
  new OutputSet(inputs).folder(out, files).write();
  return join(out, 'report.html');
}

/** The building mode, when any equipment is above the base and the options describe one. */
function needsBuilding(equipment: Equipment[], options: ReportCliOptions): BuildingMode | null {
  if (options.buildingPeriod === undefined && options.modalFactor === undefined) return null;
  if (!equipment.some((e) => e.zM > 0))
    throw usageError('--building-period and --modal-factor apply to equipment above the base (z > 0)');
  return buildingFromOptions(options);
}

interface EquipmentDemand {
  elastic: ElasticInput | null;
  motion: string;
  notes: string[];
  floor?: string;
}

/**
 * The elastic demand of one item: on grade, the record's own oscillator at the component's period
 * and damping; above the base, the floor spectrum of the one-mode building (floor.ts), broadened
 * 15% unless --broaden says otherwise; without a building, none (the code force alone).
 */
function equipmentDemand(
  e: Equipment,
  record: GroundRecord,
  building: BuildingMode | null,
  broadening: number | null,
  periodsS: Float64Array,
  method: Method,
): EquipmentDemand {
  if (e.zM === 0) {
    const value = recordPsaForComponent(record, e.periodS, e.damping, method);
    return { elastic: { ...value, source: record.name }, motion: `ground record ${record.name}`, notes: [] };
  }
  if (building === null) {
    return {
      elastic: null,
      motion:
        'none: the equipment is above the base and no building was described (--building-period, --modal-factor)',
      notes: [
        'The ground motion was not used: the equipment is above the base and no floor spectrum was made.',
      ],
    };
  }
  const grid = { periodsS, dampings: [e.damping], method };
  const floor = floorSpectrum(record, { ...building, method }, grid, broadening);
  const psa = Array.from(floor.spectrum.curves[0].psaMS2, (v) => v / STANDARD_GRAVITY_MS2);
  let value: { psaG: number; how: string };
  if (e.periodS === 'rigid') {
    const zero = Array.from(periodsS).indexOf(0);
    value =
      zero >= 0
        ? { psaG: psa[zero], how: 'PSA at T = 0 of the floor spectrum (floor PGA), rigid component' }
        : { psaG: floor.spectrum.record.pgaMS2 / STANDARD_GRAVITY_MS2, how: 'floor PGA, rigid component' };
  } else {
    value = psaAtPeriod(periodsS, psa, e.periodS, 'the floor spectrum');
  }
  const ground = responseSpectrum(record, grid);
  const figure = psaFigure(floor.spectrum, {
    methodDescription: METHOD_DESCRIPTIONS[method],
    overlays: [
      {
        label: `ground PSA, ζ = ${e.damping * 100}%`,
        periodsS: Array.from(periodsS).filter((t) => t > 0),
        psaG: Array.from(ground.curves[0].psaMS2, (v) => v / STANDARD_GRAVITY_MS2).filter(
          (_, i) => periodsS[i] > 0,
        ),
      },
    ],
  });
  const motion = `floor spectrum of ${record.name}: T_b = ${building.periodS} s, ζ_b = ${building.damping}, Γφ = ${building.modalFactor}${floor.broadening === null ? '' : `, peaks broadened ±${floor.broadening}`}`;
  return {
    elastic: { ...value, source: 'floor spectrum' },
    motion,
    notes: [
      ...floorAssumptions(floor, building, record.dtS),
      'This tool does not check that Γφ belongs to the floor at z.',
    ],
    floor: figure,
  };
}

function methodStatements(method: Method): string[] {
  return [
    `Oscillators: ${METHOD_DESCRIPTIONS[method]}; ground acceleration linear between samples; sub-steps where Δt is long against the period, and each peak refined by cubic Hermite interpolation between steps.`,
    'Spectra: SD is the peak relative displacement; PSV = ωSD and PSA = ω²SD with ω = 2π/T; SV is the peak relative velocity and SA the peak absolute acceleration; at T = 0, PSA = PGA.',
    ...Object.entries(INFO_METHODS)
      .slice(0, 6)
      .map(([key, text]) => `${key[0].toUpperCase()}${key.slice(1).replace(/_/g, ' ')}: ${text}.`),
    'Units: SI inside the program (m, s, m/s², kN); g = 9.80665 m/s² at the edges.',
  ];
}

/** Now, or the time SOURCE_DATE_EPOCH names (seconds since 1970) for a fully reproducible report. */
export function generationTime(): string {
  const epoch = process.env['SOURCE_DATE_EPOCH'];
  if (epoch !== undefined && /^\d+$/.test(epoch)) return new Date(Number(epoch) * 1000).toISOString();
  return new Date().toISOString();
}
