import type { LengthUnit } from '../base/units.js';
import { historiesFigure, psaFigure, psvFigure, sdFigure, tripartiteFigure } from '../plot/index.js';
import { integrateRecord } from '../record/integrate.js';
import type { GroundRecord } from '../record/record.js';
import type { Spectrum } from '../spectrum/spectrum.js';
import type { ReportFigure } from './html.js';

/** The figures of a record's spectra (PSA, SD, PSV, tripartite) and, with `histories`, of the record. */
export function spectrumFigures(
  record: GroundRecord,
  spectrum: Spectrum,
  shared: Parameters<typeof psaFigure>[1] & { lengthUnit: LengthUnit },
  histories: boolean,
): ReportFigure[] {
  const figures = [
    { file: 'psa.svg', caption: 'Pseudo-acceleration spectra PSA', svg: psaFigure(spectrum, shared) },
    { file: 'sd.svg', caption: 'Relative displacement spectra SD', svg: sdFigure(spectrum, shared) },
    { file: 'psv.svg', caption: 'Pseudo-velocity spectra PSV', svg: psvFigure(spectrum, shared) },
    {
      file: 'tripartite.svg',
      caption: 'Four-way (tripartite) plot of the same spectra',
      svg: tripartiteFigure(spectrum, shared),
    },
  ];
  if (histories) {
    figures.push({
      file: 'histories.svg',
      caption: 'Ground acceleration, velocity and displacement of the processed record',
      svg: historiesFigure({ ...record, ...integrateRecord(record) }, { lengthUnit: shared.lengthUnit }),
    });
  }
  return figures;
}
