import { describe, expect, it } from 'vitest';
import { closestName, editDistance } from '../../src/cli/suggest.js';

const NAMES = ['spectrum', 'info', 'record', 'design', 'damping', 'rotd', 'floor', 'ductility', 'anchor'];

describe('editDistance (optimal string alignment; Damerau 1964, Levenshtein 1966)', () => {
  it('counts insertions, deletions, substitutions and swaps of neighbours as one each', () => {
    expect(editDistance('spectrum', 'spectrum')).toBe(0);
    expect(editDistance('spectrun', 'spectrum')).toBe(1); // substitution
    expect(editDistance('spectum', 'spectrum')).toBe(1); // insertion
    expect(editDistance('recrod', 'record')).toBe(1); // swap
    expect(editDistance('', 'abc')).toBe(3);
    expect(editDistance('kitten', 'sitting')).toBe(3); // the textbook example
  });
});

describe('closestName', () => {
  it('suggests the nearest command within a third of the word, in any case', () => {
    expect(closestName('spectrun', NAMES)).toBe('spectrum');
    expect(closestName('SPECTRUM', NAMES)).toBe('spectrum');
    expect(closestName('flor', NAMES)).toBe('floor');
    expect(closestName('dampnig', NAMES)).toBe('damping');
  });

  it('suggests nothing for a word far from every name', () => {
    expect(closestName('xyzzy', NAMES)).toBeUndefined();
    expect(closestName('spec', NAMES)).toBeUndefined();
  });
});
