import { CAUTION } from '../base/caution.js';
import { VERSION } from '../base/version.js';
import { STATISTICS_METHOD } from '../batch/statistics.js';
import type { SuiteAnalysis } from '../batch/suite.js';
import { SUITE_CHECK_NOTE } from '../batch/suite-check.js';
import { definitionTable, escapeHtml, formatNumber, list, paragraph, span, table } from './html.js';
import { inlineSvg } from './inline-svg.js';
import { CAUTION_BLOCK, pageStart } from './page.js';
import { shellQuote } from './report.js';
import { warningsBlock } from './sections.js';

/** Everything the suite report shows; rendering it does no I/O. */
export interface SuiteReportInput {
  title: string;
  analysis: SuiteAnalysis;
  periodsS: readonly number[];
  /** The suite figure (suite.svg) as the figure function wrote it. */
  figureSvg: string;
  /** Records that could not be read or swept, with the reason. */
  failed: readonly { file: string; error: string }[];
  /** How the oscillators were solved, one line. */
  methodDescription: string;
  /** The command line, as words, and the files written beside the report. */
  commandLine: readonly string[];
  files: readonly string[];
}

/**
 * The suite report: one self-contained HTML page (the main report's style sheet, no script, no
 * address) with the caution, the check's result, the suite figure, the table of records with
 * their PGA and scale factors, and how the numbers were made. Every text from a file is escaped.
 */
export function renderSuiteReport(input: SuiteReportInput): string {
  const { analysis } = input;
  const { members, factors, target, scaling, check } = analysis;
  const scaled = scaling !== undefined;
  const byName = new Map(scaling?.records.map((r) => [r.name, r]) ?? []);
  const rows = members.map((m, i) => {
    const fit = byName.get(m.name);
    return [
      m.name,
      m.file,
      m.pgaG ?? null,
      scaled ? factors[i] : null,
      scaled && m.pgaG !== undefined ? m.pgaG * factors[i] : null,
      fit ? span(fit.rangeS[0], fit.rangeS[1]) : '—',
      fit ? fit.minRatio : null,
      fit ? fit.maxRatio : null,
    ];
  });
  const recordTable = table(
    `Table 2. Records of the suite${scaled ? ', each scaled by its factor' : ' (not scaled)'}`,
    [
      'Record',
      'File',
      'PGA as read (g)',
      'Scale factor',
      'PGA scaled (g)',
      'Fitted over',
      'Least scaled/target',
      'Greatest scaled/target',
    ],
    rows,
  );
  const facts: [string, string][] = [
    ['Records', `${members.length} swept${input.failed.length > 0 ? `, ${input.failed.length} failed` : ''}`],
    [
      'Periods',
      `${input.periodsS.length}, ${span(input.periodsS[0], input.periodsS[input.periodsS.length - 1])}`,
    ],
    ['Damping of the comparison', target ? `${formatNumber(target.damping * 100, 6)}%` : '—'],
    ['Target', target ? target.spectrum.description : 'none (statistics only)'],
    ['Method', input.methodDescription],
  ];
  if (check !== undefined) {
    facts.unshift(
      ['Suite check (preliminary)', check.pass ? 'PASS' : 'FAIL'],
      [
        'Criterion',
        `suite mean ≥ ${formatNumber(check.fraction)} × target from ${span(check.rangeS[0], check.rangeS[1])} (${check.rangeSource}); ${check.periodCount} grid periods checked`,
      ],
      ['Least mean/target', `${formatNumber(check.worstRatio)} at T = ${formatNumber(check.worstPeriodS)} s`],
    );
  }
  const methods = [
    `Statistics: ${STATISTICS_METHOD}.`,
    ...(scaling
      ? [
          `Scaling of each record: ${scaling.criterion}; the factor multiplies every damping's PSA alike (linear oscillators).`,
        ]
      : []),
    ...(check
      ? [`Suite check: ${check.criterion}.`, SUITE_CHECK_NOTE, ...check.warnings.map((w) => `Warning: ${w}.`)]
      : []),
  ];
  const failed =
    input.failed.length === 0
      ? ''
      : `<h2>Records that failed</h2>\n${list(input.failed.map((f) => f.error))}`;
  const command = ['quakesweep', ...input.commandLine].map(shellQuote).join(' ');
  return `${pageStart(input.title, `Suite of response spectra · quakesweep ${escapeHtml(VERSION)} · ${members.length} records`)}
</header>
${CAUTION_BLOCK}
${check === undefined ? '' : paragraph(SUITE_CHECK_NOTE, 'caution-inline')}
${definitionTable('Table 1. The suite at a glance', facts)}
${warningsBlock(analysis.warnings).join('\n')}
<figure id="figure-1">
${inlineSvg(input.figureSvg, 'suite-1')}
<figcaption><strong>Figure 1.</strong> ${escapeHtml(`The records' PSA${scaled ? ' (scaled)' : ''}, their mean, median and ±1σ band${target ? ', the target' : ''}${check ? ', the fraction of it checked and the check range' : ''}`)} (also saved as <code>suite.svg</code>)</figcaption>
</figure>
${recordTable}
${failed}
<h2>Method</h2>
${list(methods)}
${paragraph(`Every value at every period is in suite.csv and suite.json beside this report (${input.files.join(', ')}).`, 'note')}
<pre class="command">${escapeHtml(command)}</pre>
<footer>${escapeHtml(CAUTION)}</footer>
</body>
</html>
`;
}
