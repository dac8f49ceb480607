import { CAUTION } from '../base/caution.js';
import type { LengthUnit } from '../base/units.js';
import { VERSION } from '../base/version.js';
import type { GroundMotionMeasures } from '../record/measures.js';
import type { DampingComparison } from '../spectrum/damping.js';
import type { RotDSpectra } from '../spectrum/rotd.js';
import type { Spectrum } from '../spectrum/spectrum.js';
import type { TargetFit } from '../spectrum/target.js';
import { anchorageSection, type ReportAnchorage } from './anchorage-section.js';
import { DUCTILITY_LIMIT, ductilitySection, type ReportDuctility } from './ductility-section.js';
import type { ReportFigure } from './html.js';
import { definitionTable, escapeHtml, formatNumber, list, paragraph, span, table } from './html.js';
import { inlineSvg } from './inline-svg.js';
import { CAUTION_BLOCK, pageStart } from './page.js';
import {
  dampingSection,
  measuresSection,
  peaksSection,
  processingSection,
  type RecordFacts,
  recordSection,
  rotdSection,
  targetSection,
} from './sections.js';
import { usableBand, usableBandText } from './usable-band.js';

/** Everything one report shows. The function that renders it does no I/O. */
export interface ReportInput {
  title: string;
  /** Paragraphs under the title (where the inputs come from, what they are for). */
  notes: string[];
  read: RecordFacts;
  spectrum: Spectrum;
  measures: GroundMotionMeasures;
  lengthUnit: LengthUnit;
  spectrumFigures: ReportFigure[];
  /** The fit of the record to a target spectrum, when there is one. */
  target?: TargetFit;
  damping?: { comparison: DampingComparison; figure: ReportFigure };
  rotd?: { spectra: RotDSpectra; figure: ReportFigure };
  /** Constant-ductility spectra, when asked for (report --ductility). */
  ductility?: ReportDuctility;
  anchorage: ReportAnchorage[];
  /** Method statements from the rest of the program (oscillator, spectra). */
  methods: string[];
  /** The command line that produced the report, as words (quoted for a POSIX shell when shown). */
  commandLine: string[];
  /** The folder the command was run from, for the relative paths in it. */
  workingDirectory: string;
  /** ISO 8601 time of generation: the one item that differs between two runs of the same command. */
  generatedAt: string;
  /** The other files written beside report.html. */
  files: string[];
  /** The title block's names; each left as a blank line to fill in by hand when not given. */
  titleBlock?: TitleBlock;
  /** Every input file (records, targets, equipment, spectra) with its SHA-256, as the caller read them. */
  inputFiles?: readonly InputFile[];
}

/** Who the report is for, who prepared it and who checked it. */
export interface TitleBlock {
  project?: string;
  preparedBy?: string;
  checkedBy?: string;
}

/** One input file of the report: what it is, its path as given, its SHA-256 (hex). */
export interface InputFile {
  role: string;
  path: string;
  sha256: string;
}

/** Quote a word for a POSIX shell, only where it needs it. */
export function shellQuote(word: string): string {
  if (/^[A-Za-z0-9_@%+=:,./-]+$/.test(word)) return word;
  return `'${word.replace(/'/g, `'\\''`)}'`;
}

/** Limits of use, stated in every report. */
export const LIMITS_OF_USE = [
  'Linear elastic single-degree-of-freedom oscillators with viscous damping: no yielding, no soil–structure interaction, no higher modes of the equipment.',
  'The spectra describe this one record as processed here; one record is not a hazard level. Design motions come from a site-specific hazard study or the governing code.',
  'Processing (baseline, taper, filter) changes long-period values: periods beyond about 1/(1.25 × high-pass corner) are not reliable after high-pass filtering (common practice).',
  'Code spectra are drawn from the parameters given; this program does not select site class, risk category or coefficients.',
  'Anchorage results are demands only; anchor capacities and embedments are not checked.',
];

/**
 * The self-contained report: one HTML document with its style sheet and figures inline, no script
 * and no reference to any address, so it opens offline and prints on A4 or US letter. Every piece
 * of text from a file or an option is escaped.
 */
export function renderReport(input: ReportInput): string {
  const contents: string[] = [];
  const body: string[] = [];
  const add = (id: string, title: string, ...parts: string[]) => {
    const heading = `${contents.length + 1}. ${escapeHtml(title)}`;
    contents.push(`<li><a href="#${id}">${heading}</a></li>`);
    body.push(`<section id="${id}">\n<h2>${heading}</h2>\n${parts.join('\n')}\n</section>`);
  };
  let tableNumber = 3;
  let figureNumber = 1;
  const figure = (f: ReportFigure, id: string) => {
    const n = figureNumber++;
    return `<figure id="figure-${n}">\n${inlineSvg(f.svg, `${id}-${n}`)}\n<figcaption><strong>Figure ${n}.</strong> ${escapeHtml(f.caption)} (also saved as <code>${escapeHtml(f.file)}</code>)</figcaption>\n</figure>`;
  };
  const { spectrum, target, damping, rotd } = input;
  add('record', 'Record', recordSection(input.read, spectrum.record));
  add('processing', 'Processing applied', processingSection(spectrum.record.processing));
  add('measures', 'Ground-motion measures', measuresSection(input.measures));
  add(
    'spectra',
    'Response spectra',
    peaksSection(spectrum, input.lengthUnit, tableNumber++),
    paragraph('All values for every period are in spectra.json and spectra.csv beside this report.', 'note'),
    ...usableBandNote(spectrum.record.processing),
    ...input.spectrumFigures.map((f) => figure(f, 'spectra')),
  );
  if (target) add('target', 'Comparison with the target spectrum', targetSection(target, tableNumber++));
  if (damping !== undefined) {
    const table = dampingSection(damping.comparison, tableNumber++);
    add('damping', 'Damping comparison', table, figure(damping.figure, 'damping'));
  }
  if (rotd !== undefined) {
    const table = rotdSection(rotd.spectra, tableNumber++);
    add('rotd', 'Two horizontal components: RotD50 and RotD100', table, figure(rotd.figure, 'rotd'));
  }
  if (input.ductility !== undefined) {
    const section = ductilitySection(input.ductility, input.lengthUnit, tableNumber);
    tableNumber += 2;
    add(
      'inelastic',
      'Inelastic response',
      section,
      ...input.ductility.figures.map((f) => figure(f, 'inelastic')),
    );
  }
  if (input.anchorage.length > 0) {
    const parts: string[] = [paragraph(CAUTION, 'caution-inline')];
    input.anchorage.forEach((item, i) => {
      parts.push(anchorageSection(item, `${contents.length + 1}.${i + 1}`, tableNumber));
      tableNumber += 3;
      for (const f of item.figures) parts.push(figure(f, `anchor-${i + 1}`));
    });
    add('anchorage', 'Equipment anchorage demands', ...parts);
  }
  add('method', 'Method and assumptions', list(input.methods));
  add('limits', 'Limits of use', list([...LIMITS_OF_USE, ...(input.ductility ? [DUCTILITY_LIMIT] : [])]));
  add('reproduce', 'Reproducing this report', reproduceSection(input, tableNumber));

  return `${pageStart(input.title, `Response spectrum calculation · quakesweep ${escapeHtml(VERSION)} · record ${escapeHtml(input.read.name)}`)}
${titleBlockTable(input.titleBlock ?? {}, input.generatedAt)}
</header>
${CAUTION_BLOCK}
${input.notes.map((note) => paragraph(note, 'intro')).join('\n')}
<nav class="contents"><strong>Contents</strong><ol class="plain">
${contents.join('\n')}
</ol></nav>
${body.join('\n')}
<footer>${escapeHtml(CAUTION)}</footer>
</body>
</html>
`;
}

function reproduceSection(input: ReportInput, tableNumber: number): string {
  const { periodsS, curves, method } = input.spectrum;
  const command = ['quakesweep', ...input.commandLine].map(shellQuote).join(' ');
  return [
    definitionTable(`Table ${tableNumber}. Program and run`, [
      ['Program', `quakesweep ${VERSION}`],
      ['Run from the folder', input.workingDirectory],
      ['Files written beside report.html', input.files.join(', ')],
    ]),
    paragraph(
      'Command line (run it again with the same inputs and version to get the same numbers and figures):',
    ),
    `<pre class="command">${escapeHtml(command)}</pre>`,
    `<p class="nondeterministic">Generated at <time datetime="${escapeHtml(input.generatedAt)}">${escapeHtml(input.generatedAt)}</time>. This time is the one item of the report that is not determined by the inputs; everything else is the same on every run (set SOURCE_DATE_EPOCH to fix it too).</p>`,
    table(
      `Table ${tableNumber + 1}. Oscillator grid`,
      ['Quantity', 'Value'],
      [
        ['Periods', `${periodsS.length}, ${span(periodsS[0], periodsS[periodsS.length - 1])}`],
        ['Damping ratios', curves.map((c) => `${formatNumber(c.damping * 100, 6)}%`).join(', ')],
        ['Step method', method],
      ],
    ),
    inputFilesTable(input.inputFiles ?? [], tableNumber + 2),
  ].join('\n');
}

/** A line to fill in by hand, for a name or a signature left blank. */
const BLANK = '<span class="blank" aria-label="blank, to be filled in"></span>';

/**
 * The title block: project, prepared by, checked by, each with a line to sign, and the date of
 * generation (the date of `generatedAt`); names not given are left as blank lines.
 */
export function titleBlockTable(block: TitleBlock, generatedAt: string): string {
  const name = (value: string | undefined) =>
    value === undefined || value.trim() === '' ? BLANK : escapeHtml(value);
  const rows = [
    ['Project', name(block.project), ''],
    ['Prepared by', name(block.preparedBy), BLANK],
    ['Checked by', name(block.checkedBy), BLANK],
    ['Date', escapeHtml(generatedAt.slice(0, 10)), ''],
  ];
  const body = rows
    .map(([label, value, signature]) => {
      const sign = signature === '' ? '<td></td>' : `<td class="signature">Signature ${signature}</td>`;
      return `<tr><th scope="row">${label}</th><td>${value}</td>${sign}</tr>`;
    })
    .join('\n');
  return `<table class="title-block">\n${body}\n</table>`;
}

/** The input files and their SHA-256, so a reader can tell that the files at hand are these. */
export function inputFilesTable(files: readonly InputFile[], tableNumber: number): string {
  if (files.length === 0)
    return paragraph('Input files: none named (the inputs were given to the library directly).');
  const rows = files.map((f) => [f.role, f.path, f.sha256]);
  const caption = `Table ${tableNumber}. Input files and their SHA-256 (of the bytes read)`;
  return `<div class="input-hashes">\n${table(caption, ['Input', 'File', 'SHA-256'], rows)}\n</div>`;
}

/** The spectra section's note of the usable period band, when the record was filtered. */
function usableBandNote(steps: ReportInput['spectrum']['record']['processing']): string[] {
  const band = usableBand(steps);
  if (band === null) return [];
  return [
    paragraph(
      `Usable period band after filtering: ${usableBandText(band)} (section "Processing applied" states the rule); values outside it are shown but reflect the filter.`,
      'note usable-band',
    ),
  ];
}
