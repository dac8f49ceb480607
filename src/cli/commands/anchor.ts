import { readFileSync } from 'node:fs';
import type { Command } from 'commander';
import { analyseAnchorage, parseDemandChoice } from '../../anchorage/anchorage.js';
import { parseAnchorRule } from '../../anchorage/bolt-group.js';
import { parseEquipment } from '../../anchorage/equipment.js';
import { usageError } from '../../base/errors.js';
import { anchorageToCsv } from '../../formats/anchorage-csv.js';
import { anchorageToJson } from '../../formats/anchorage-json.js';
import { anchorPlanInput } from '../../formats/anchorage-plan.js';
import { anchorTable } from '../../formats/anchorage-table.js';
import { parseMethod } from '../../oscillator/recurrence.js';
import { anchorPlanSvg } from '../../plot/anchor-plan-figure.js';
import { count } from '../announce.js';
import { addOutputOptions, type OutputCliOptions, outputFormat, writeProduct } from '../options/format.js';
import { elasticFromOptions, type MotionCliOptions } from '../options/motion.js';
import { addProcessingOptions } from '../options/processing.js';
import { addRecordOptions } from '../options/record.js';

export interface AnchorCliOptions extends MotionCliOptions, OutputCliOptions {
  equipment?: string;
  demand?: string;
  method?: string;
  anchorRule?: string;
}

const collect = (value: string, previous: string[]) => [...previous, value];

export function registerAnchor(program: Command): void {
  const command = program
    .command('anchor')
    .description(
      'preliminary anchor demands (tension, shear) of rigidly based equipment: ASCE 7-16 or 7-22 §13.3.1 force and/or a record’s elastic demand',
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
  addProcessingOptions(command);
  addOutputOptions(command, 'also write the anchor plan view, DIR/anchor-plan.svg').action(runAnchor);
}

export async function runAnchor(options: AnchorCliOptions): Promise<void> {
  if (options.equipment === undefined) throw usageError('--equipment <file> is required');
  outputFormat(options);
  const records = options.record ?? [];
  if (records.length > 0 && options.spectrum !== undefined)
    throw usageError('give --record or --spectrum, not both');
  const hasMotion = records.length > 0 || options.spectrum !== undefined;
  const demand = parseDemandChoice(options.demand ?? (hasMotion ? 'max' : 'code'));
  const method = parseMethod(options.method ?? 'newmark-average');
  const anchorRule = parseAnchorRule(options.anchorRule ?? 'projected');

  const equipment = parseEquipment(readFileSync(options.equipment, 'utf8'), options.equipment);
  const { elastic, notes } = await elasticFromOptions(options, equipment, demand, method);
  const analysis = analyseAnchorage(equipment, { elastic, demand, anchorRule });
  analysis.assumptions.push(...notes);
  const inputs = [options.equipment, ...records, ...(options.spectrum ? [options.spectrum] : [])];
  await writeProduct(inputs, options, {
    json: () => anchorageToJson(analysis),
    csv: () => anchorageToCsv(analysis),
    table: () => anchorTable(analysis),
    figures: () => [['anchor-plan.svg', anchorPlanSvg(anchorPlanInput(analysis))]],
    summary: `anchor demands of ${analysis.equipment.name}, ${count(analysis.anchors.perAnchor.length, 'anchor')} (${analysis.governing} force governs)`,
  });
}
