import type { Equipment } from '../anchorage/equipment.js';
import { INFO_METHODS } from '../formats/info.js';
import { spectrumToCsv } from '../formats/spectrum-csv.js';
import { formatJson, spectrumToJson } from '../formats/spectrum-json.js';
import { targetToJson } from '../formats/target.js';
import { METHOD_DESCRIPTIONS, type Method } from '../oscillator/recurrence.js';
import { dampingFigure, type PeriodAxis, rotdFigure } from '../plot/index.js';
import { groundMotionMeasures } from '../record/measures.js';
import type { GroundRecord } from '../record/record.js';
import { compareDamping } from '../spectrum/damping.js';
import type { DesignSpectrum } from '../spectrum/design.js';
import type { BuildingMode } from '../spectrum/floor.js';
import { responseSpectrum, rotdThreads } from '../spectrum/spectrum.js';
import { fitTarget, targetOverlay, targetRecord } from '../spectrum/target.js';
import { rotDSpectraParallel } from '../threads/rotd-pool.js';
import { type DuctilityRequest, ductilityMethodStatement, reportDuctility } from './ductility-section.js';
import { equipmentAnchorage } from './equipment-demand.js';
import { type ReportInput, renderReport } from './report.js';
import { spectrumFigures } from './spectrum-figures.js';

/**
 * What a report is made of: records already read and processed, and the choices of its sections.
 * The command line, folder and time the report states are the caller's: the library reads none.
 */
export interface ReportRequest
  extends Partial<
      Pick<
        ReportInput,
        'title' | 'notes' | 'lengthUnit' | 'commandLine' | 'workingDirectory' | 'titleBlock' | 'inputFiles'
      >
    >,
    Pick<ReportInput, 'generatedAt'> {
  /** The record as read (its facts are shown as read). */
  read: GroundRecord;
  /** The same record processed: the spectra are of this one. */
  processed: GroundRecord;
  grid: { periodsS: Float64Array; dampings: Float64Array; method: Method };
  /** A target spectrum to fit (over `rangeS`), the fit applied to every output with `apply`. */
  target?: { spectrum: DesignSpectrum; rangeS?: [number, number]; apply?: boolean };
  axes?: 'log' | 'linear';
  /**
   * The x axis of every spectrum figure. Unset, each figure takes its own: frequency for the floor
   * spectra of equipment (as equipment is specified and tested by frequency), period for the others.
   */
  axis?: PeriodAxis;
  /** The second horizontal component, processed alike: adds RotD50 and RotD100. */
  pair?: { record: GroundRecord; angleStepDeg: number };
  /** Equipment for anchorage demands, each with the file it was read from. */
  equipment?: { file: string; value: Equipment }[];
  /** The one-mode building of equipment above the base, and the floor spectrum's peak broadening. */
  building?: BuildingMode | null;
  broadening?: number | null;
  /**
   * With `pair`: equipment above the base takes the envelope of the floor spectra of the record
   * and of the pair (the pair scaled by the record's target factor when the fit is applied).
   */
  floorEnvelope?: boolean;
  /** Constant-ductility spectra at one damping ratio (5% where the grid has it): the inelastic section. */
  ductility?: DuctilityRequest;
}

/**
 * A whole report from library calls: the spectra (fitted to the target), the damping comparison,
 * RotD, the anchorage demands and every figure, as files by name in the order they are listed,
 * report.html last.
 */
export async function assembleReport(request: ReportRequest): Promise<Map<string, string>> {
  const { processed, grid } = request;
  const lengthUnit = request.lengthUnit ?? 'm';
  const swept = responseSpectrum(processed, grid);
  const { fit, spectrum } =
    request.target === undefined
      ? { fit: undefined, spectrum: swept }
      : fitTarget(swept, request.target.spectrum, request.target);
  const record = targetRecord(processed, fit);
  const methodDescription = METHOD_DESCRIPTIONS[spectrum.method];
  const files = new Map<string, string>();
  files.set('spectra.json', formatJson({ ...spectrumToJson(spectrum), ...(fit && targetToJson(fit)) }));
  files.set('spectra.csv', spectrumToCsv(spectrum, { lengthUnit, target: fit }));
  const overlays = fit === undefined ? [] : [targetOverlay(spectrum.periodsS, fit)];
  const axis = request.axis;
  const shared = { axes: request.axes ?? 'log', axis, lengthUnit, methodDescription, overlays };
  const input: ReportInput = {
    title: request.title ?? `Response spectra of ${record.name}`,
    notes: request.notes ?? [],
    read: request.read,
    spectrum,
    measures: groundMotionMeasures(record),
    lengthUnit,
    spectrumFigures: spectrumFigures(record, spectrum, shared, true),
    target: fit,
    anchorage: [],
    methods: methodStatements(spectrum.method),
    commandLine: request.commandLine ?? [],
    workingDirectory: request.workingDirectory ?? '',
    generatedAt: request.generatedAt,
    files: [],
    titleBlock: request.titleBlock,
    inputFiles: request.inputFiles,
  };
  const isFivePercent = (damping: number) => Math.abs(damping - 0.05) < 1e-12;
  if (spectrum.curves.length > 1 && spectrum.curves.some((c) => isFivePercent(c.damping))) {
    const comparison = compareDamping(spectrum);
    const svg = dampingFigure({ record: spectrum.record, methodDescription, comparison, axis });
    const caption = 'PSA at each damping ratio relative to 5%';
    input.damping = { comparison, figure: { file: 'damping.svg', caption, svg } };
  }
  if (request.pair !== undefined) {
    const second = request.pair.record;
    // One damping ratio (5% where the grid has it): the rotation sweep costs about 180 single sweeps.
    const damping = grid.dampings.find(isFivePercent) ?? grid.dampings[0];
    const samples = Math.max(processed.accelMS2.length, second.accelMS2.length);
    const spectra = await rotDSpectraParallel(processed, second, {
      ...grid,
      dampings: [damping],
      angleStepDeg: request.pair.angleStepDeg,
      threads: rotdThreads(grid.periodsS.length, 1, samples),
    });
    const svg = rotdFigure({ spectra, methodDescription: METHOD_DESCRIPTIONS[spectra.method], axis });
    input.rotd = {
      spectra,
      figure: { file: 'rotd.svg', caption: 'RotD50, RotD100 and geometric mean', svg },
    };
    input.methods.push(
      `RotD spectra: at ζ = ${damping * 100}% only; both components processed alike and unscaled (a target scaling is not applied to them).`,
    );
  }
  if (request.ductility !== undefined) {
    // One damping ratio, as for RotD: the strength search runs the oscillator tens of times a cell.
    const damping = grid.dampings.find(isFivePercent) ?? grid.dampings[0];
    input.ductility = reportDuctility(record, request.ductility, { periodsS: grid.periodsS, damping }, axis);
    input.methods.push(ductilityMethodStatement(input.ductility.spectra));
  }
  // Both horizontals alike: the pair takes the record's scale factor (one factor for the pair).
  const floorRecords =
    request.floorEnvelope && request.pair !== undefined ? [targetRecord(request.pair.record, fit)] : [];
  (request.equipment ?? []).forEach((equipment, i) => {
    const anchorage = equipmentAnchorage(i + 1, equipment, record, { ...request, floorRecords });
    files.set(`anchorage-${i + 1}.json`, formatJson(anchorage.json));
    input.anchorage.push(anchorage);
  });
  const axisLine = figureAxisStatement(
    axis,
    input.anchorage.some((a) => a.figures.some((f) => f.file.startsWith('floor-'))),
  );
  if (axisLine !== undefined) input.methods.push(axisLine);
  const figures = [
    input.spectrumFigures,
    input.damping?.figure ?? [],
    input.rotd?.figure ?? [],
    input.ductility?.figures ?? [],
    input.anchorage.flatMap((a) => a.figures),
  ].flat();
  for (const f of figures) files.set(f.file, f.svg);
  input.files = [...files.keys()];
  files.set('report.html', renderReport(input));
  return files;
}

/** The method statements of a report: the oscillators, the spectra and the record measures. */
export function methodStatements(method: Method): string[] {
  return [
    `Oscillators: ${METHOD_DESCRIPTIONS[method]}; ground acceleration linear between samples; sub-steps where Δt is long against the period, and each peak refined by cubic Hermite interpolation between steps.`,
    'Spectra: SD is the peak relative displacement; PSV = ωSD and PSA = ω²SD with ω = 2π/T; SV is the peak relative velocity and SA the peak absolute acceleration; at T = 0, PSA = PGA.',
    ...Object.entries(INFO_METHODS)
      .slice(0, 6)
      .map(([key, text]) => `${key[0].toUpperCase()}${key.slice(1).replace(/_/g, ' ')}: ${text}.`),
    'Units: SI inside the program (m, s, m/s², kN); g = 9.80665 m/s² at the edges.',
  ];
}

/** What the report says of its figures' x axes when any is of frequency; none when all are of period. */
export function figureAxisStatement(axis: PeriodAxis | undefined, floorFigures: boolean): string | undefined {
  if (axis === 'frequency')
    return 'Figures: spectra drawn against frequency f = 1/T (Hz); T = 0 (the PGA) is left off and its value stated under each figure.';
  if (axis === undefined && floorFigures)
    return 'Figures: spectra against period T; the floor spectra of equipment against frequency f = 1/T (Hz), as equipment is specified by frequency.';
  return undefined;
}
