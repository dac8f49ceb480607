import { usageError } from '../base/errors.js';

/**
 * The force–deformation relation of a yielding oscillator. `elastoplastic`: stiffness k up to the
 * yield force f_y, then none. `bilinear`: stiffness α·k past yield with kinematic hardening (the
 * yield band of width 2(1 − α)·f_y moves with the displacement; Chopra, Dynamics of Structures,
 * §7.1 and §5.7, from memory). Elastoplastic is bilinear with α = 0.
 */
export type Hysteresis = { kind: 'elastoplastic' } | { kind: 'bilinear'; alpha: number };

/** The post-yield stiffness ratio α of a model (0 for elastoplastic). */
export function postYieldRatio(model: Hysteresis): number {
  return model.kind === 'bilinear' ? model.alpha : 0;
}

/** Check a model given as a value (as parseHysteresis checks text): α finite, 0 ≤ α < 1. */
export function checkHysteresis(model: Hysteresis): Hysteresis {
  if (model.kind === 'elastoplastic') return model;
  if (model.kind === 'bilinear' && model.alpha >= 0 && model.alpha < 1) return model;
  const text =
    model.kind === 'bilinear' ? `bilinear:${model.alpha}` : String((model as { kind: unknown }).kind);
  throw modelError(text);
}

/** Parse `elastoplastic` or `bilinear:α` (0 ≤ α < 1), as `--model` takes them. */
export function parseHysteresis(text: string): Hysteresis {
  const spec = text.trim();
  if (spec === 'elastoplastic') return { kind: 'elastoplastic' };
  const match = /^bilinear:(.+)$/.exec(spec);
  if (match !== null) {
    const alphaText = match[1].trim();
    const alpha = Number(alphaText);
    if (alphaText !== '' && alpha >= 0 && alpha < 1) return { kind: 'bilinear', alpha };
  }
  throw modelError(text);
}

/** A model name for people and outputs: `elastoplastic` or `bilinear:0.05`. */
export function describeHysteresis(model: Hysteresis): string {
  return model.kind === 'elastoplastic' ? 'elastoplastic' : `bilinear:${model.alpha}`;
}

function modelError(text: string) {
  return usageError(`--model '${text}': use elastoplastic or bilinear:α with 0 ≤ α < 1`);
}
