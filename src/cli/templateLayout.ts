/**
 * Where things are on the shipped templates (assets/templates/*.xlsx). The generator
 * (scripts/make-templates.ts) lays the sheets out from these, and the demo and the tests
 * read results back through them, so the three cannot drift apart.
 */
import * as path from 'node:path';
import { packageRoot } from './paths';

/** The folder of the shipped templates. */
export const TEMPLATE_DIR = path.join(packageRoot(), 'assets', 'templates');

/** The potentials range every template's formulas use as their `table` argument. */
export const POTENTIALS_SHEET = 'Potentials';
export const POTENTIALS_RANGE = `${POTENTIALS_SHEET}!$A$2:$D$40`;

/** Cathodic-protection check sheet (invented Tessivar Water Board). */
export const CP_TEMPLATE = {
  file: 'cathodic-protection-check.xlsx',
  sheet: 'CP check',
  criterionCell: 'B3',
  scaleCell: 'D3',
  headerRow: 5,
  firstRow: 6,
  lastRow: 17,
  col: {
    station: 'A',
    chainage: 'B',
    electrode: 'C',
    reading: 'D',
    temp: 'E',
    vsCse: 'F',
    margin: 'G',
    result: 'H',
  },
  couple: {
    titleRow: 20,
    cell: 'B21',
    species: 'B22:C22',
    values: 'B23:C23',
    temp: 'B24',
    emf: 'B25',
    e0: 'B26',
    source: 'B27',
  },
  cautionsRow: 30,
} as const;

/** Cell-voltage sweep over composition and temperature (invented Velkamoor Cell Works). */
export const SWEEP_TEMPLATE = {
  file: 'cell-voltage-sweep.xlsx',
  sheet: 'Sweep',
  cellText: 'B4',
  speciesRow: 6,
  firstRow: 7,
  lastRow: 18,
  col: {
    label: 'A',
    zinc: 'B',
    copper: 'C',
    temp: 'D',
    emf: 'E',
    e0: 'F',
    handCheck: 'G',
    differenceMicroV: 'H',
  },
  maxDifferenceCell: 'H20',
  cautionsRow: 23,
} as const;

/** Electrode calibration sheet (invented Drennavik Analytical laboratory). */
export const CAL_TEMPLATE = {
  file: 'electrode-calibration.xlsx',
  sheet: 'Calibration',
  headerRow: 4,
  firstRow: 5,
  /** Readings: one block of `buffersPerTemp` rows per calibration temperature. */
  temps: 3,
  buffersPerTemp: 3,
  col: { temp: 'A', pH: 'B', mV: 'C' },
  summaryHeaderRow: 16,
  summaryFirstRow: 17,
  summaryCol: {
    temp: 'A',
    slope: 'B',
    ideal: 'C',
    percent: 'D',
    offset: 'E',
    result: 'F',
    refE0: 'G',
  },
  cautionsRow: 23,
} as const;

/** The cautions every template and the demo carry. */
export const CAUTIONS = [
  'Results are thermodynamic estimates computed from standard potentials and the values entered; they are not measurements and do not replace them.',
  'Cathodic-protection decisions (for example the -850 mV vs saturated Cu/CuSO4 criterion, or 100 mV of polarization; NACE SP0169, ISO 15589-1) follow the applicable standards, local codes and licensed practice.',
  'Battery, plating-bath and gas-evolution decisions likewise follow the applicable standards, local codes and licensed practice.',
] as const;
