import type { Command } from 'commander';
import { usageError } from '../../base/errors.js';
import { type Hysteresis, parseHysteresis } from '../../inelastic/hysteresis.js';

/** The target ductilities when --ductility is not given. */
export const DEFAULT_DUCTILITIES = '1,1.5,2,4,6,8';

export interface InelasticCliOptions {
  ductility?: string;
  model?: string;
  strength?: string;
}

/** Add --ductility, --model and --strength (the `ductility` command's own options). */
export function addInelasticOptions(command: Command): Command {
  return command
    .option('--ductility <list>', 'target ductility ratios μ ≥ 1, e.g. 1,2,4', DEFAULT_DUCTILITIES)
    .option(
      '--model <model>',
      'force–deformation relation: elastoplastic or bilinear:α (0 ≤ α < 1)',
      'elastoplastic',
    )
    .option(
      '--strength <list>',
      'instead of target ductilities: given strengths, as R_y (e.g. 2,4) or A_y in g (e.g. 0.2g,0.5g); gives the ductility demand',
    );
}

/** Target ductility ratios from a list such as "1,1.5,2": finite, ≥ 1, none twice; ascending. */
export function parseDuctilities(text: string): number[] {
  const values = text.split(',').map((raw) => {
    const part = raw.trim();
    const value = Number(part);
    if (part === '' || !Number.isFinite(value)) throw usageError(`--ductility: '${raw}' is not a number`);
    if (value < 1) throw usageError(`--ductility: ${part} is below 1; a ductility ratio μ = um/uy is ≥ 1`);
    return value;
  });
  const twice = values.find((value, i) => values.indexOf(value) !== i);
  if (twice !== undefined) throw usageError(`--ductility: ${twice} appears twice`);
  return values.sort((a, b) => a - b);
}

/** Given strengths: every entry R_y (a plain number > 0) or every entry A_y (a number > 0 and 'g'). */
export function parseStrengths(text: string): { ry: number[] } | { ayG: number[] } {
  const parts = text.split(',').map((raw) => raw.trim());
  const inG = parts.map((part) => /g$/i.test(part));
  if (inG.some((g) => g !== inG[0]))
    throw usageError(
      `--strength '${text}': give every strength as R_y (2,4) or every one as A_y in g (0.2g,0.5g)`,
    );
  const values = parts.map((part, i) => {
    const value = Number(inG[i] ? part.slice(0, -1).trim() : part);
    if (part === '' || !Number.isFinite(value)) throw usageError(`--strength: '${part}' is not a number`);
    if (!(value > 0))
      throw usageError(`--strength: ${part} is not above 0; a strength of 0 cannot hold the oscillator`);
    return value;
  });
  const twice = values.find((value, i) => values.indexOf(value) !== i);
  if (twice !== undefined) throw usageError(`--strength: ${twice} appears twice`);
  return inG[0] ? { ayG: values } : { ry: values };
}

/** The model of --model (default elastoplastic). */
export function modelFromOptions(options: InelasticCliOptions): Hysteresis {
  return parseHysteresis(options.model ?? 'elastoplastic');
}
