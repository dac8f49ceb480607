/**
 * The golden cases: every command and output format over the invented demo records and a few
 * generated ones. IN stands for the folder of inputs, OUT for the case's own output folder.
 * The inputs are made afresh for each run (copies of records/ and seeded `synth` records), so the
 * bytes depend on nothing but the program.
 */
export interface GoldenCase {
  name: string;
  argv: string[];
  env?: Record<string, string>;
}

/** The words of a command line (no word holds a space). */
const w = (line: string): string[] => line.split(' ');

const GRID = '--periods 0,0.02,0.05,0.1,0.2,0.3,0.5,1,2,3,5';
const H1 = 'IN/marrowby-h1.csv';
const H2 = 'IN/marrowby-h2.csv';
const WRAPPED = 'IN/marrowby-h2-wrapped.txt --layout wrapped --skip 4 --dt 0.01 --units cm/s2';
const FIXED_DATE = { SOURCE_DATE_EPOCH: '1780000000' };

export const GOLDEN_CASES: GoldenCase[] = [
  { name: 'spectrum-table', argv: w(`spectrum ${H1} --units g`) },
  { name: 'spectrum-json', argv: w(`spectrum ${H1} --units g --damping 2%,5%,10% --out OUT/s.json`) },
  { name: 'spectrum-json-stdout', argv: w(`spectrum ${H2} --units g ${GRID} --format json`) },
  {
    name: 'spectrum-csv-cm',
    argv: w(`spectrum ${H1} --units g ${GRID} --format csv --length-unit cm --out OUT/s.csv`),
  },
  {
    name: 'spectrum-svg',
    argv: w(`spectrum ${H1} --units g --damping 2%,5% --out OUT/s.json --svg OUT --histories`),
  },
  {
    name: 'spectrum-svg-linear',
    argv: w(`spectrum IN/gen-a.csv --units g ${GRID} --axes linear --svg OUT --length-unit in`),
  },
  { name: 'spectrum-wrapped', argv: w(`spectrum ${WRAPPED} ${GRID} --format json`) },
  {
    name: 'spectrum-single-processed',
    argv: w(
      `spectrum IN/gen-single.txt --units m/s2 --dt 0.005 ${GRID} --baseline linear --taper 5% --filter bandpass:0.1-25 --format csv`,
    ),
  },
  {
    name: 'spectrum-resample',
    argv: w(`spectrum IN/gen-b.csv --units g ${GRID} --resample 0.01 --format json`),
  },
  {
    name: 'spectrum-linear-method',
    argv: w(`spectrum IN/gen-b.csv --units g ${GRID} --method newmark-linear --damping 0,5%,20%`),
  },
  {
    name: 'spectrum-exact-method',
    argv: w(
      `spectrum IN/gen-a.csv --units g ${GRID} --method piecewise-exact --damping 5%,50% --format json`,
    ),
  },
  {
    name: 'spectrum-js-kernel',
    argv: w(`spectrum IN/gen-a.csv --units g ${GRID} --kernel js --format json`),
  },
  {
    name: 'spectrum-threads',
    argv: w(
      `spectrum ${H1} --units g --periods 0.01:10:300 --damping 1%,2%,5%,10%,20% --threads 2 --format csv --out OUT/s.csv`,
    ),
  },
  {
    name: 'spectrum-target-asce',
    argv: w(`spectrum ${H1} --units g ${GRID} --target asce7-16:sds=1.0,sd1=0.6,tl=8`),
  },
  {
    name: 'spectrum-target-ec8-scaled',
    argv: w(
      `spectrum ${H1} --units g --target ec8:type=1,ground=C,ag=0.25 --scale-range 0.1:2 --apply-scale --out OUT/t.json --svg OUT`,
    ),
  },
  {
    name: 'spectrum-target-asce722-multi-period',
    argv: w(
      `spectrum ${H1} --units g ${GRID} --target asce7-22:multi-period=IN/site-multiperiod-7-22.csv --scale-range 0.1:3 --format json`,
    ),
  },
  {
    name: 'spectrum-target-asce722-two-period-svg',
    argv: w(`spectrum ${H2} --units g --target asce7-22:sds=0.9,sd1=0.5,tl=8 --out OUT/t.json --svg OUT`),
  },
  {
    name: 'spectrum-target-table-csv',
    argv: w(`spectrum ${H2} --units g ${GRID} --target IN/target.csv --format csv`),
  },
  { name: 'info-table', argv: w(`info ${H1} --units g`) },
  { name: 'info-csv-by-extension', argv: w(`info ${H1} --units g --baseline linear --out OUT/i.csv`) },
  {
    name: 'record-csv-processed-with-histories',
    argv: w(
      `record IN/gen-a.csv --units g --baseline linear --filter highpass:0.1 --with velocity,displacement --length-unit cm --out OUT/p.csv`,
    ),
  },
  { name: 'record-txt-resampled', argv: w(`record IN/gen-b.csv --units g --resample 0.01 --out OUT/p.txt`) },
  {
    name: 'record-json-scaled-to-target',
    argv: w(
      `record IN/gen-a.csv --units g ${GRID} --target asce7-16:sds=1.0,sd1=0.6,tl=8 --apply-scale --accel-unit m/s2 --format json`,
    ),
  },
  { name: 'record-wrapped-stdout', argv: w(`record ${WRAPPED} --scale 0.5`) },
  { name: 'info-json-svg', argv: w(`info ${H2} --units g --out OUT/i.json --svg OUT`) },
  {
    name: 'info-wrapped-json',
    argv: w(`info ${WRAPPED} --format json --bracket-threshold 0.02 --smoothing none --svg OUT`),
  },
  { name: 'design-asce-table', argv: w('design --code asce7-16 --sds 1 --sd1 0.6 --tl 8') },
  {
    name: 'design-asce-json-svg',
    argv: w('design --code asce7-16 --sds 1.2 --sd1 0.5 --tl 6 --out OUT/d.json --svg OUT'),
  },
  {
    name: 'design-ec8-csv',
    argv: w('design --code ec8 --type 2 --ground D --ag 0.3 --damping 10% --format csv'),
  },
  {
    name: 'design-vertical-7-16-table',
    argv: w('design --vertical --code asce7-16 --sds 1 --ss 1.5 --site-class D'),
  },
  {
    name: 'design-vertical-7-22-json-svg',
    argv: w(
      'design --vertical --code asce7-22 --sds 1.2 --ss 1.8 --site-class CD --out OUT/v.json --svg OUT',
    ),
  },
  {
    name: 'design-vertical-beyond-2s',
    argv: w('design --vertical --code asce7-16 --sds 1 --ss 1 --site-class C --periods 0.1,3'),
  },
  { name: 'design-table-file', argv: w('design --table IN/target.csv --format json --svg OUT') },
  {
    name: 'design-asce722-two-period',
    argv: w('design --code asce7-22 --sds 1.2 --sd1 0.48 --tl 6 --svg OUT'),
  },
  {
    name: 'design-asce722-multi-period',
    argv: w('design --code asce7-22 --multi-period IN/site-multiperiod-7-22.csv --out OUT/d.json --svg OUT'),
  },
  {
    name: 'design-asce722-multi-period-csv',
    argv: w(
      'design --code asce7-22 --multi-period IN/site-multiperiod-7-22.csv --periods 0.05:8:12 --format csv',
    ),
  },
  { name: 'damping-table', argv: w(`damping ${H1} --units g --damping 2%,5%,10%,20%`) },
  {
    name: 'damping-json-svg',
    argv: w(`damping ${H2} --units g ${GRID} --damping 1%,5%,15% --out OUT/k.json --svg OUT`),
  },
  { name: 'damping-csv', argv: w(`damping IN/gen-a.csv --units g ${GRID} --format csv`) },
  { name: 'rotd-table', argv: w(`rotd ${H1} ${H2} --units g ${GRID}`) },
  {
    name: 'rotd-json-svg',
    argv: w(`rotd ${H1} ${H2} --units g --angle-step 0.5 --out OUT/r.json --svg OUT`),
  },
  {
    name: 'rotd-csv-threads',
    argv: w(`rotd ${H1} ${H2} --units g --damping 2%,5% --threads 2 --format csv`),
  },
  { name: 'rotd-error-angle', argv: w(`rotd ${H1} ${H2} --units g --angle-step 3`) },
  { name: 'floor-table', argv: w(`floor ${H1} --units g ${GRID} --building-period 0.6 --modal-factor 1.3`) },
  {
    name: 'floor-json-svg-broaden',
    argv: w(
      `floor ${H1} --units g --building-period 0.45 --building-damping 3% --modal-factor 1.4 --broaden --out OUT/f.json --svg OUT`,
    ),
  },
  {
    name: 'floor-csv',
    argv: w(
      `floor IN/gen-b.csv --units g ${GRID} --building-period 1.2 --modal-factor 1.2 --broaden 0.1 --format csv`,
    ),
  },
  {
    name: 'spectrum-svg-frequency',
    argv: w(`spectrum ${H1} --units g --damping 2%,5% --axis frequency --svg OUT --out OUT/s.json`),
  },
  {
    name: 'spectrum-frequencies-csv',
    argv: w(`spectrum ${H2} --units g --frequencies 0.5,1,2,5,10,20 --format csv`),
  },
  {
    name: 'spectrum-error-periods-and-frequencies',
    argv: w(`spectrum ${H1} --units g ${GRID} --frequencies 1:10:5`),
  },
  {
    name: 'design-svg-frequency',
    argv: w(
      'design --code asce7-16 --sds 1.2 --sd1 0.5 --tl 6 --frequencies 0.1:100:40 --axis frequency --format csv --out OUT/d.csv --svg OUT',
    ),
  },
  {
    name: 'damping-svg-frequency',
    argv: w(
      `damping ${H2} --units g ${GRID} --damping 2%,5%,10% --axis frequency --out OUT/k.json --svg OUT`,
    ),
  },
  {
    name: 'rotd-svg-frequency',
    argv: w(`rotd ${H1} ${H2} --units g ${GRID} --axis frequency --format csv --out OUT/r.csv --svg OUT`),
  },
  {
    name: 'floor-svg-frequency',
    argv: w(
      `floor ${H1} --units g --frequencies 0.2:50:60 --building-period 0.45 --modal-factor 1.4 --broaden --axis frequency --out OUT/f.json --svg OUT`,
    ),
  },
  {
    name: 'floor-set-table',
    argv: w(
      `floor ${H1} ${H2} IN/gen-a.csv --units g ${GRID} --building-period 0.5 --modal-factor 1.3 --broaden`,
    ),
  },
  {
    name: 'floor-set-json-svg',
    argv: w(
      `floor ${H1} ${H2} --units g --damping 2%,5% --building-period 0.8 --modal-factor 1.3 --broaden --out OUT/f.json --svg OUT`,
    ),
  },
  {
    name: 'floor-set-csv',
    argv: w(
      `floor ${H1} ${H2} IN/gen-a.csv --units g ${GRID} --building-period 0.5 --modal-factor 1.3 --format csv`,
    ),
  },
  {
    name: 'floor-set-error-twice',
    argv: w(`floor ${H1} ${H2} ${H1} --units g --building-period 0.5 --modal-factor 1.3`),
  },
  // Inelastic spectra: a few periods and ductilities (the yielding search is the costly part).
  { name: 'ductility-table', argv: w(`ductility ${H1} --units g --periods 0,0.2,1 --ductility 1,2,4`) },
  {
    name: 'ductility-json-bilinear',
    argv: w(
      'ductility IN/gen-a.csv --units g --periods 0,0.2,1 --ductility 1,2,4 --model bilinear:0.05 --damping 2%,5% --out OUT/d.json',
    ),
  },
  {
    name: 'ductility-csv',
    argv: w(`ductility ${H2} --units g --periods 0,0.2,1 --ductility 1,2,4 --baseline linear --format csv`),
  },
  {
    name: 'ductility-strength-json',
    argv: w(`ductility ${H1} --units g --periods 0.2,1 --strength 2,4 --format json`),
  },
  {
    name: 'ductility-strength-ay-table',
    argv: w(`ductility ${H1} --units g --frequencies 1,5 --strength 0.2g,0.5g`),
  },
  {
    name: 'ductility-svg',
    argv: w(`ductility ${H1} --units g --periods 0.1,0.3,1,3 --ductility 1,2,4 --svg OUT/figs`),
  },
  {
    name: 'ductility-error-both',
    argv: w(`ductility ${H1} --units g --strength 2 --ductility 1,2`),
  },
  { name: 'anchor-code-table', argv: w('anchor --equipment IN/equipment-generator.json --units g') },
  {
    name: 'anchor-code-csv',
    argv: w('anchor --equipment IN/equipment-cabinet-floor4.json --demand code --out OUT/a.csv'),
  },
  {
    name: 'anchor-record-json-svg',
    argv: w(
      `anchor --equipment IN/equipment-generator.json --record ${H1} --record ${H2} --units g --out OUT/a.json --svg OUT`,
    ),
  },
  { name: 'anchor-7-22-table', argv: w('anchor --equipment IN/equipment-pump-roof-7-22.json') },
  {
    name: 'anchor-7-22-spectrum-json-svg',
    argv: w(
      'anchor --equipment IN/equipment-pump-roof-7-22.json --spectrum IN/floor-spectrum.json --units g --out OUT/a.json --svg OUT',
    ),
  },
  {
    name: 'anchor-biaxial-record',
    argv: w(
      'anchor --equipment IN/equipment-pump.json --record IN/gen-a.csv --units g --demand record --anchor-rule biaxial --format json',
    ),
  },
  {
    name: 'anchor-floor-spectrum',
    argv: w(
      'anchor --equipment IN/equipment-cabinet-floor4.json --spectrum IN/floor-spectrum.json --units g --demand max',
    ),
  },
  {
    name: 'anchor-floor-envelope',
    argv: w(
      'anchor --equipment IN/equipment-cabinet-floor4.json --spectrum IN/floor-envelope.json --units g --demand max --format json',
    ),
  },
  { name: 'synth-stdout', argv: w('synth --seed 11 --duration 3 --dt 0.02') },
  {
    name: 'synth-file',
    argv: [
      ...w(
        'synth --seed 12 --duration 5 --pga 0.2 --site-frequency 4 --site-damping 0.4 --high-pass 0.5 --name',
      ),
      'Golden test (invented)',
      ...w('--out OUT/g.csv'),
    ],
  },
  // --skip 5 skips the names row, whose 'accel_g' would state the unit.
  { name: 'error-missing-units', argv: w(`spectrum ${H1} --skip 5`) },
  { name: 'info-fixed-header', argv: w(`info IN/marrowby-h1-fixed.txt --format json`) },
  { name: 'spectrum-wrapped-header', argv: w(`spectrum IN/marrowby-h2-wrapped.txt ${GRID}`) },
  { name: 'info-units-contradict', argv: w(`info ${H1} --units cm/s2`) },
  { name: 'error-unknown-option', argv: w(`info ${H1} --units g --smoothnig 20`) },
  {
    name: 'report-plain',
    argv: [...w(`report IN/gen-a.csv --units g ${GRID} --out OUT/report --note`), 'Invented inputs.'],
    env: FIXED_DATE,
  },
  {
    name: 'report-full',
    argv: [
      ...w(
        `report ${H1} --units g --damping 2%,5% --target asce7-16:sds=1.0,sd1=0.6,tl=8 --apply-scale --pair ${H2} --angle-step 1 --equipment IN/equipment-generator.json --equipment IN/equipment-cabinet-floor4.json --building-period 0.5 --modal-factor 1.3 --broaden --title`,
      ),
      'Golden report (invented)',
      ...w('--length-unit mm --out OUT/report'),
    ],
    env: FIXED_DATE,
  },
  {
    name: 'report-frequency',
    argv: w(`report IN/gen-a.csv --units g ${GRID} --damping 2%,5% --axis frequency --out OUT/report`),
    env: FIXED_DATE,
  },
  {
    name: 'report-ductility',
    argv: w(
      `report IN/gen-a.csv --units g ${GRID} --ductility 1,2,4 --model bilinear:0.05 --ductility-periods 0.1,0.3,1,3 --out OUT/report`,
    ),
    env: FIXED_DATE,
  },
  { name: 'demo', argv: w('demo --out OUT/demo'), env: FIXED_DATE },
  {
    name: 'batch',
    argv: w(`batch IN/gen-*.csv ${H1} --units g ${GRID} --damping 2%,5% --jobs 2 --out OUT/suite`),
  },
  {
    name: 'batch-scaled-check',
    argv: w(
      `batch IN/gen-*.csv ${H1} ${H2} --units g ${GRID} --target asce7-16:sds=1.0,sd1=0.6,tl=8 --scale-each --structure-period 1 --threads 2 --out OUT/suite`,
    ),
  },
  {
    name: 'batch-shards-merge',
    argv: w(`batch IN/gen-*.csv ${H1} ${H2} --units g ${GRID} --jobs 1 --shard 1/2 --out OUT/s1`),
  },
];

/** Commands run after a case, in the same output folder (the second shard and the merge). */
export const GOLDEN_FOLLOW_UPS: Record<string, string[][]> = {
  'batch-shards-merge': [
    w(`batch IN/gen-*.csv ${H1} ${H2} --units g ${GRID} --jobs 1 --shard 2/2 --out OUT/s2`),
    w('merge OUT/s1 OUT/s2 --out OUT/merged'),
  ],
};
