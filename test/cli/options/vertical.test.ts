import { describe, expect, it } from 'vitest';
import { designFromOptions } from '../../../src/cli/options/design.js';
import { verticalFromOptions } from '../../../src/cli/options/vertical.js';

describe('design --vertical', () => {
  it('builds the §11.9 spectrum of either edition from --sds, --ss and --site-class', () => {
    const s = designFromOptions({ vertical: true, code: 'asce7-22', sds: '1.2', ss: '1.8', siteClass: 'cd' });
    expect(s.vertical).toBe(true);
    expect(s.code).toBe('asce7-22');
    // plateau 0.8 C_v S_DS with C_v = 1.26 (Table 11.9-1, C column at S_S 1.8, from memory): 1.2096 g
    expect(s.psaG(0.1)).toBeCloseTo(1.2096, 12);
    expect(
      designFromOptions({ vertical: true, code: 'asce7-16', sds: '1', ss: '1', siteClass: 'D' }).psaG(0),
    ).toBeCloseTo(
      0.39, // 0.3·1.3·1.0
      12,
    );
  });

  it('refuses what it does not read, and asks for what it needs', () => {
    const v = { vertical: true, code: 'asce7-16', sds: '1', ss: '1', siteClass: 'D' };
    expect(() => verticalFromOptions({ ...v, tl: '8' })).toThrow('--tl does not apply to --vertical');
    expect(() => verticalFromOptions({ ...v, code: 'ec8' })).toThrow(
      /give --code asce7-16 or --code asce7-22/,
    );
    expect(() => verticalFromOptions({ ...v, ss: undefined })).toThrow('--vertical needs --ss');
    expect(() => verticalFromOptions({ ...v, siteClass: undefined })).toThrow(
      '--vertical needs --site-class',
    );
    expect(() =>
      designFromOptions({ code: 'asce7-16', sds: '1', sd1: '0.6', tl: '8', siteClass: 'D' }),
    ).toThrow('--site-class applies to --vertical only');
  });
});
