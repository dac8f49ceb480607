import type { SuiteAnalysis } from '../batch/suite.js';
import type { SuiteSettings } from '../batch/work.js';
import type { SuiteFailure } from '../formats/suite.js';
import { dampingWarnings } from '../oscillator/grid.js';
import { drawnTargetCurve } from '../spectrum/target-curve.js';

/**
 * suite.svg and suite.html of a whole batch run; the figure and report modules (and jsdom) load
 * only here, once the records are done.
 */
export async function suiteFigures(input: {
  analysis: SuiteAnalysis;
  settings: Pick<SuiteSettings, 'periodsS' | 'dampings'>;
  failed: readonly SuiteFailure[];
  methodDescription: string;
  commandLine: readonly string[];
  written: readonly string[];
}): Promise<[string, string][]> {
  const { suiteFigure } = await import('../plot/suite-figure.js');
  const { renderSuiteReport } = await import('./suite-report.js');
  const { analysis, settings } = input;
  const d = figureDamping(analysis, settings.dampings);
  const { target, check, scaling } = analysis;
  const svg = suiteFigure({
    periodsS: settings.periodsS,
    damping: settings.dampings[d],
    members: analysis.members.map((m) => ({ name: m.name, psaG: m.psaG[d] })),
    curve: analysis.statistics[d],
    scaled: scaling !== undefined,
    target: target && {
      description: target.spectrum.description,
      psaG: target.psaG,
      curve: drawnTargetCurve(target.spectrum, settings.periodsS),
    },
    check,
    methodDescription: input.methodDescription,
    notes: [
      ...(scaling
        ? [
            `Scaling: each record by one factor, ${scaling.criterion}; factors in suite.html, suite.json and suite.csv.`,
          ]
        : []),
      ...figureWarnings(analysis, settings.dampings[d]),
    ],
  });
  const html = renderSuiteReport({
    title: 'Suite of ground-motion records: response spectra',
    analysis,
    periodsS: settings.periodsS,
    figureSvg: svg,
    failed: input.failed,
    methodDescription: input.methodDescription,
    commandLine: input.commandLine,
    files: input.written,
  });
  return [
    ['suite.svg', svg],
    ['suite.html', html],
  ];
}

/** The warnings that concern the figure (its damping's, the records'), the first few of them. */
function figureWarnings(analysis: SuiteAnalysis, damping: number): string[] {
  const heavy = new Set(dampingWarnings(analysis.statistics.map((c) => c.damping)));
  const warnings = [...dampingWarnings([damping]), ...analysis.warnings.filter((w) => !heavy.has(w))];
  const shown = 3;
  const lines = warnings.slice(0, shown).map((w) => `Warning: ${w}`);
  if (warnings.length > shown)
    lines.push(`… and ${warnings.length - shown} more warnings, listed in suite.html and suite.json.`);
  return lines;
}

/** The damping drawn: the target's, else 5% when swept, else the first. */
function figureDamping(analysis: SuiteAnalysis, dampings: readonly number[]): number {
  if (analysis.target !== undefined) return analysis.target.dampingIndex;
  const five = dampings.findIndex((d) => Math.abs(d - 0.05) < 1e-12);
  return Math.max(five, 0);
}
