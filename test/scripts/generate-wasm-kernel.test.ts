import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
// @ts-expect-error: a build script in JavaScript, without type declarations.
import { wasmKernelSource } from '../../scripts/generate-wasm-kernel.mjs';

// assembly/sweep.ts is generated (npm run generate) and committed: it must be what its generator
// writes today, from the layout in src/oscillator/layout.ts (read from dist/, built by the global
// setup), so that neither can change without the other.
describe('the WebAssembly kernel generator', () => {
  it('writes the committed assembly/sweep.ts', () => {
    const committed = readFileSync(new URL('../../assembly/sweep.ts', import.meta.url), 'utf8');
    expect(wasmKernelSource() === committed).toBe(true);
  });
});
