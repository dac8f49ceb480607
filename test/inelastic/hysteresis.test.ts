import { describe, expect, it } from 'vitest';
import {
  checkHysteresis,
  describeHysteresis,
  parseHysteresis,
  postYieldRatio,
} from '../../src/inelastic/hysteresis.js';

describe('hysteresis models', () => {
  it('parses elastoplastic and bilinear:α', () => {
    expect(parseHysteresis('elastoplastic')).toEqual({ kind: 'elastoplastic' });
    expect(parseHysteresis(' bilinear:0.05 ')).toEqual({ kind: 'bilinear', alpha: 0.05 });
    expect(parseHysteresis('bilinear:0')).toEqual({ kind: 'bilinear', alpha: 0 });
    expect(postYieldRatio(parseHysteresis('bilinear:0.1'))).toBe(0.1);
    expect(postYieldRatio({ kind: 'elastoplastic' })).toBe(0);
    expect(describeHysteresis(parseHysteresis('bilinear:0.05'))).toBe('bilinear:0.05');
  });

  it.each(['bilinear:1', 'bilinear:-0.1', 'bilinear:', 'bilinear:x', 'bilinear:NaN', 'plastic', ''])(
    "refuses '%s' in one line",
    (text) => {
      expect(() => parseHysteresis(text)).toThrow(
        `--model '${text}': use elastoplastic or bilinear:α with 0 ≤ α < 1`,
      );
    },
  );

  it('checks models given as values', () => {
    expect(checkHysteresis({ kind: 'bilinear', alpha: 0.5 })).toEqual({ kind: 'bilinear', alpha: 0.5 });
    expect(() => checkHysteresis({ kind: 'bilinear', alpha: 1 })).toThrow(/use elastoplastic or bilinear/);
    expect(() => checkHysteresis({ kind: 'bilinear', alpha: Number.NaN })).toThrow(/bilinear:NaN/);
  });
});
