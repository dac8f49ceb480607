import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import {
  ductilityFromOptions,
  optionWords,
  type ReportCliOptions,
  reportRequest,
  sha256OfFile,
} from '../../../src/cli/options/report.js';
import { useCliFolder } from '../../helpers/cli-folder.js';

const folder = useCliFolder('quakesweep-report-options-', (f) => {
  f.writeWindowedSine('main.txt', 1.2);
  f.writeWindowedSine('second.txt', 2.4);
});
const generator = 'records/equipment-generator.json'; // invented, on grade (z = 0)
const cabinet = 'records/equipment-cabinet-floor4.json'; // invented, on level 4 (z > 0)
const at = (name: string) => join(folder.path, name);
const base = (): ReportCliOptions => ({ units: 'g', dt: '0.01', periods: '0,0.2,1', out: at('report') });

describe('reportRequest', () => {
  it('keeps the record as read beside the processed one, and names only the main record', async () => {
    const { request, inputs, out } = await reportRequest(
      at('main.txt'),
      { ...base(), name: 'Main (invented)', resample: '0.02', pair: at('second.txt'), lengthUnit: 'mm' },
      ['report', 'main.txt'],
    );
    expect(out).toBe(at('report'));
    expect(request.read.dtS).toBe(0.01);
    expect(request.processed.dtS).toBe(0.02); // --resample applies to the spectra's record only
    expect(request.read.name).toBe('Main (invented)');
    expect(request.pair?.record.name).toBe('second'); // the pair keeps its file's name
    expect(request.pair?.record.dtS).toBe(0.02); // and is processed alike
    expect(request.pair?.angleStepDeg).toBe(1);
    expect(Array.from(request.grid.periodsS)).toEqual([0, 0.2, 1]);
    expect(request.lengthUnit).toBe('mm');
    expect(request.axes).toBe('log');
    expect(request.building).toBeNull();
    expect(request.commandLine).toEqual(['report', 'main.txt']);
    expect(inputs).toEqual([at('main.txt'), at('second.txt')]);
  });

  it('describes the building only for equipment above the base', async () => {
    const options = { ...base(), equipment: [generator, cabinet], buildingPeriod: '0.8', modalFactor: '1.3' };
    const { request, inputs } = await reportRequest(at('main.txt'), { ...options, broaden: true }, []);
    expect(request.building).toEqual({ periodS: 0.8, damping: 0.05, modalFactor: 1.3 });
    expect(request.broadening).toBe(0.15);
    expect(request.equipment?.map((e) => e.file)).toEqual([generator, cabinet]);
    expect(inputs).toEqual([at('main.txt'), generator, cabinet]);
    await expect(reportRequest(at('main.txt'), { ...options, equipment: [generator] }, [])).rejects.toThrow(
      '--building-period and --modal-factor apply to equipment above the base (z > 0)',
    );
    const envelope = { ...options, floorEnvelope: true };
    const paired = await reportRequest(at('main.txt'), { ...envelope, pair: at('second.txt') }, []);
    expect(paired.request.floorEnvelope).toBe(true);
    await expect(reportRequest(at('main.txt'), envelope, [])).rejects.toThrow(
      '--floor-envelope needs --pair and a building (--building-period, --modal-factor)',
    );
  });

  it('reads an ASCE 7-22 multi-period target and counts its table among the inputs', async () => {
    const table = 'records/site-multiperiod-7-22.csv'; // invented
    const { request, inputs } = await reportRequest(
      at('main.txt'),
      { ...base(), target: `asce7-22:multi-period=${table}` },
      [],
    );
    expect(request.target?.spectrum.code).toBe('asce7-22');
    expect(request.target?.spectrum.parameters.form).toBe('multi-period');
    expect(inputs).toEqual([at('main.txt'), table]);
  });

  it('gives the title block its names and every input its SHA-256', async () => {
    const options = {
      ...base(),
      project: 'Invented yard',
      preparedBy: 'A. Person (invented)',
      pair: at('second.txt'),
    };
    const { request } = await reportRequest(at('main.txt'), options, []);
    expect(request.titleBlock).toEqual({
      project: 'Invented yard',
      preparedBy: 'A. Person (invented)',
      checkedBy: undefined,
    });
    expect(request.inputFiles?.map((f) => [f.role, f.path])).toEqual([
      ['record', at('main.txt')],
      ['second component', at('second.txt')],
    ]);
    for (const f of request.inputFiles ?? []) expect(f.sha256).toMatch(/^[0-9a-f]{64}$/);
  });

  it('sha256OfFile: the FIPS 180-2 example "abc"', () => {
    writeFileSync(at('abc.txt'), 'abc');
    // FIPS 180-2, Appendix B.1: SHA-256("abc").
    expect(sha256OfFile(at('abc.txt'))).toBe(
      'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad',
    );
    expect(sha256OfFile('-')).toMatch(/standard input/);
  });

  it('states the time SOURCE_DATE_EPOCH gives, for a reproducible report', async () => {
    const saved = process.env['SOURCE_DATE_EPOCH'];
    process.env['SOURCE_DATE_EPOCH'] = '86400'; // one day after 1970-01-01T00:00:00Z
    try {
      const { request } = await reportRequest(at('main.txt'), base(), []);
      expect(request.generatedAt).toBe('1970-01-02T00:00:00.000Z');
    } finally {
      if (saved === undefined) delete process.env['SOURCE_DATE_EPOCH'];
      else process.env['SOURCE_DATE_EPOCH'] = saved;
    }
  });

  it('checks the options and the folder before reading anything', async () => {
    const missing = at('no-such-record.txt');
    const refuse = (options: ReportCliOptions, message: string) =>
      expect(reportRequest(missing, { ...base(), ...options }, [])).rejects.toThrow(message);
    await refuse({ out: undefined }, '--out <dir> is required');
    await refuse({ out: at('no/such/folder') }, 'its parent folder does not exist');
    await refuse({ lengthUnit: 'cubit' }, 'cubit');
    await refuse({ axes: 'polar' }, "--axes 'polar': use log or linear");
    await refuse({ applyScale: true }, '--apply-scale needs --target');
  });
});

describe('optionWords', () => {
  it('writes camelCase options as --kebab-case flags, switches bare, lists once per item', () => {
    expect(
      optionWords({ units: 'g', buildingPeriod: '0.8', broaden: true, note: ['a b', 'c'], angleStep: '0.5' }),
    ).toEqual([
      '--units',
      'g',
      '--building-period',
      '0.8',
      '--broaden',
      '--note',
      'a b',
      '--note',
      'c',
      '--angle-step',
      '0.5',
    ]);
  });
});

describe('ductilityFromOptions', () => {
  it('reads --ductility (sorted), --model and --ductility-periods; none without --ductility', () => {
    expect(ductilityFromOptions({})).toBeUndefined();
    expect(ductilityFromOptions({ ductility: '4,1,2' })).toEqual({
      ductilities: [1, 2, 4],
      model: { kind: 'elastoplastic' },
    });
    const own = ductilityFromOptions({ ductility: '2', model: 'bilinear:0.05', ductilityPeriods: '0.1,1' });
    expect(own?.model).toEqual({ kind: 'bilinear', alpha: 0.05 });
    expect(Array.from(own?.periodsS ?? [])).toEqual([0.1, 1]);
  });

  it('refuses bad values and the options that need --ductility, naming the option', () => {
    expect(() => ductilityFromOptions({ ductility: '0.5' })).toThrow(/--ductility: 0.5 is below 1/);
    expect(() => ductilityFromOptions({ ductility: '2', model: 'bilinear:1' })).toThrow(/--model/);
    expect(() => ductilityFromOptions({ ductility: '2', ductilityPeriods: '0:1:5' })).toThrow(
      /^--ductility-periods '0:1:5'/,
    );
    expect(() => ductilityFromOptions({ model: 'elastoplastic' })).toThrow(
      '--model and --ductility-periods apply with --ductility',
    );
  });

  it('gives the request its inelastic section', async () => {
    const { request } = await reportRequest(at('main.txt'), { ...base(), ductility: '1,2' }, []);
    expect(request.ductility?.ductilities).toEqual([1, 2]);
  });
});
