/**
 * The registry list: every family of worksheet functions, one line each. To add a family,
 * write src/functions/specs/<family>.ts exporting `<FAMILY>_SPECS` and append one line here
 * (DEVELOPERS.md, "How to add a function").
 */
export { NERNST_SPECS } from './nernst';
export { EQUILIBRIUM_SPECS } from './equilibrium';
export { ACTIVITY_SPECS } from './activity';
export { REFERENCE_SPECS } from './references';
export { TABLE_SPECS } from './table';
export { SOLUTIONS_SPECS } from './solutions';
export { EPH_SPECS } from './eph';
export { FARADAY_SPECS } from './faraday';
export { CORROSION_SPECS } from './corrosion';
export { KINETICS_SPECS } from './kinetics';
export { MEASUREMENT_SPECS } from './measurement';
export { THERMO_SPECS } from './thermo';
