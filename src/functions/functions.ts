/**
 * The ECHEM custom functions for Excel: one wrapper per catalogue entry, nothing else.
 *
 * What users read in Excel's formula bar comes from these JSDoc comments: the build's
 * metadata plugin turns them into functions.json (ids, descriptions, parameters, help links).
 * Every parameter is `any[][]` (matrix dimensionality) because each may be one cell, a column
 * of cases or a range; every result is `any[][]`, one row per case, so a sweep spills.
 *
 * Each wrapper hands Excel's arguments to the host-independent catalogue (catalogue.ts, which
 * the headless runner calls too) and maps its result for Excel (excelErrors.ts). Potentials
 * are in volts vs SHE, temperatures in °C (default 25), activities in mol/L (solutes) or bar
 * (gases); `table` is always the user's potentials range (half-reaction | E° (V) |
 * dE°/dT (mV/K) | source), the built-in table where it is omitted.
 */
/* eslint-disable @typescript-eslint/no-explicit-any -- the metadata plugin reads `any[][]` as "any value, matrix" */
import * as catalogue from './catalogue';
import { toExcel } from './excelErrors';

/**
 * Electrode potential of a half-reaction, or EMF of a cell or reaction, in V vs SHE, by the Nernst equation at the activities and temperature given. Example: =ECHEM.POTENTIAL("Cu2+/Cu", "Cu2+", 0.01) gives 0.27784.
 * @customfunction POTENTIAL
 * @helpurl https://localhost:3000/taskpane.html#ref-potential
 * @param reaction Half-reaction (a reduction), couple such as "Cu2+/Cu", cell diagram such as "Zn | Zn2+ || Cu2+ | Cu", or full reaction; one cell or a column of cases
 * @param [species] Names of the species whose activities follow, one per column of values, e.g. "Cu2+" or "pH" (default: none, standard state)
 * @param [values] Activities: mol/L for solutes, bar for gases, pH under a "pH" column; one row per case
 * @param [temp_C] Temperature in °C (default 25); one cell or a column of cases
 * @param [table] Your potentials range: half-reaction | E° (V) | dE°/dT (mV/K) | source (default: the built-in table)
 * @returns E in V vs SHE, one row per case
 */
export function POTENTIAL(
  reaction: any[][],
  species?: any[][],
  values?: any[][],
  temp_C?: any[][],
  table?: any[][],
): any[][] {
  return toExcel(catalogue.potential, reaction, species, values, temp_C, table);
}

/**
 * Standard potential E° in V vs SHE of a half-reaction, couple or cell, at temp_C (with the table's dE°/dT; where it has none, E° at 25 °C). Example: =ECHEM.STDPOTENTIAL("Cu2+/Cu") gives 0.337.
 * @customfunction STDPOTENTIAL
 * @helpurl https://localhost:3000/taskpane.html#ref-stdpotential
 * @param reaction Half-reaction, couple such as "Fe3+/Fe2+", cell diagram or full reaction; one cell or a column of cases
 * @param [temp_C] Temperature in °C (default 25)
 * @param [table] Your potentials range (default: the built-in table)
 * @returns E° in V vs SHE, one row per case
 */
export function STDPOTENTIAL(reaction: any[][], temp_C?: any[][], table?: any[][]): any[][] {
  return toExcel(catalogue.stdPotential, reaction, temp_C, table);
}

/**
 * Reaction quotient Q from the activities given (pure solids, liquids and water left out); #NUM! where Q leaves Excel's number range (use LOGQ). Example: =ECHEM.QUOTIENT("Zn + Cu2+ -> Zn2+ + Cu", {"Zn2+","Cu2+"}, {0.1,0.01}) gives 10.
 * @customfunction QUOTIENT
 * @helpurl https://localhost:3000/taskpane.html#ref-quotient
 * @param reaction Half-reaction, couple, cell diagram or full reaction; one cell or a column of cases
 * @param species Names of the species whose activities follow, one per column of values
 * @param values Activities: mol/L for solutes, bar for gases; one row per case
 * @param [table] Your potentials range (default: the built-in table)
 * @returns Q (dimensionless), one row per case
 */
export function QUOTIENT(reaction: any[][], species: any[][], values: any[][], table?: any[][]): any[][] {
  return toExcel(catalogue.quotient, reaction, species, values, table);
}

/**
 * log10 of the reaction quotient Q, computed in log space so that it never overflows. Example: =ECHEM.LOGQ("Zn + Cu2+ -> Zn2+ + Cu", {"Zn2+","Cu2+"}, {0.1,0.01}) gives 1.
 * @customfunction LOGQ
 * @helpurl https://localhost:3000/taskpane.html#ref-logq
 * @param reaction Half-reaction, couple, cell diagram or full reaction; one cell or a column of cases
 * @param species Names of the species whose activities follow, one per column of values
 * @param values Activities: mol/L for solutes, bar for gases; one row per case
 * @param [table] Your potentials range (default: the built-in table)
 * @returns log10 Q, one row per case
 */
export function LOGQ(reaction: any[][], species: any[][], values: any[][], table?: any[][]): any[][] {
  return toExcel(catalogue.logQ, reaction, species, values, table);
}

/**
 * log10 of the equilibrium constant, nFE°/(RT ln 10), from a reaction (E° and n from the table) or from E° in V and n. Example: =ECHEM.LOGK(1.10, 2) gives 37.188.
 * @customfunction LOGK
 * @helpurl https://localhost:3000/taskpane.html#ref-logk
 * @param reaction_or_E0 A reaction, couple or cell, or a standard potential E° in V; one cell or a column of cases
 * @param [n] Electrons transferred (needed with a potential; default: from the reaction)
 * @param [temp_C] Temperature in °C (default 25)
 * @param [table] Your potentials range (default: the built-in table)
 * @returns log10 K, one row per case
 */
export function LOGK(reaction_or_E0: any[][], n?: any[][], temp_C?: any[][], table?: any[][]): any[][] {
  return toExcel(catalogue.logK, reaction_or_E0, n, temp_C, table);
}

/**
 * Equilibrium constant K = 10^(nFE°/(RT ln 10)) from a reaction or from E° in V and n; #NUM! where K leaves Excel's number range (use LOGK). Example: =ECHEM.EQCONST("Zn + Cu2+ -> Zn2+ + Cu") gives 1.40E+37.
 * @customfunction EQCONST
 * @helpurl https://localhost:3000/taskpane.html#ref-eqconst
 * @param reaction_or_E0 A reaction, couple or cell, or a standard potential E° in V; one cell or a column of cases
 * @param [n] Electrons transferred (needed with a potential; default: from the reaction)
 * @param [temp_C] Temperature in °C (default 25)
 * @param [table] Your potentials range (default: the built-in table)
 * @returns K (dimensionless), one row per case
 */
export function EQCONST(reaction_or_E0: any[][], n?: any[][], temp_C?: any[][], table?: any[][]): any[][] {
  return toExcel(catalogue.eqConst, reaction_or_E0, n, temp_C, table);
}

/**
 * Gibbs energy ΔG = −nFE in kJ/mol from a potential E in V and n, or the standard ΔG° of a reaction. Example: =ECHEM.GIBBS(0.434, 2) gives -83.749.
 * @customfunction GIBBS
 * @helpurl https://localhost:3000/taskpane.html#ref-gibbs
 * @param reaction_or_E A reaction, couple or cell (gives ΔG°), or a potential E in V; one cell or a column of cases
 * @param [n] Electrons transferred (needed with a potential; default: from the reaction)
 * @param [temp_C] Temperature in °C (default 25), for E° of a reaction
 * @param [table] Your potentials range (default: the built-in table)
 * @returns ΔG in kJ/mol, one row per case
 */
export function GIBBS(reaction_or_E: any[][], n?: any[][], temp_C?: any[][], table?: any[][]): any[][] {
  return toExcel(catalogue.gibbs, reaction_or_E, n, temp_C, table);
}

/**
 * Number of electrons n transferred in the balanced half-reaction, cell or reaction. Example: =ECHEM.ELECTRONS("Zn + Cu2+ -> Zn2+ + Cu") gives 2.
 * @customfunction ELECTRONS
 * @helpurl https://localhost:3000/taskpane.html#ref-electrons
 * @param reaction Half-reaction, couple, cell diagram or full reaction; one cell or a column of cases
 * @param [table] Your potentials range (default: the built-in table)
 * @returns n, one row per case
 */
export function ELECTRONS(reaction: any[][], table?: any[][]): any[][] {
  return toExcel(catalogue.electrons, reaction, table);
}

/**
 * Balanced reaction text from a skeleton redox equation, half-reaction, couple or cell; medium "acid" balances with H+ and H2O, "base" with OH- and H2O. Example: =ECHEM.BALANCE("MnO4- + Fe2+ -> Mn2+ + Fe3+", "acid") gives MnO4- + 5 Fe2+ + 8 H+ -> Mn2+ + 5 Fe3+ + 4 H2O.
 * @customfunction BALANCE
 * @helpurl https://localhost:3000/taskpane.html#ref-balance
 * @param reaction Skeleton equation such as "MnO4- + Fe2+ -> Mn2+ + Fe3+", or a half-reaction, couple or cell; one cell or a column of cases
 * @param [medium] "acid", "base" or empty (default: no H+, OH- or H2O added)
 * @param [table] Your potentials range (default: the built-in table)
 * @returns Balanced reaction text, one row per case
 */
export function BALANCE(reaction: any[][], medium?: any[][], table?: any[][]): any[][] {
  return toExcel(catalogue.balance, reaction, medium, table);
}

/**
 * Nernst slope RT ln10/(nF) in V per decade of activity, from the exact SI constants. Example: =ECHEM.NERNSTSLOPE(25, 1) gives 0.059159.
 * @customfunction NERNSTSLOPE
 * @helpurl https://localhost:3000/taskpane.html#ref-nernstslope
 * @param [temp_C] Temperature in °C (default 25); one cell or a column of cases
 * @param [n] Electrons transferred (default 1)
 * @returns Slope in V per decade, one row per case
 */
export function NERNSTSLOPE(temp_C?: any[][], n?: any[][]): any[][] {
  return toExcel(catalogue.nernstSlope, temp_C, n);
}

/**
 * EMF in V of a concentration cell: two like electrodes whose solutions differ in one species' activity (right minus left, as IUPAC writes cells). Example: =ECHEM.CONCCELL("Cu2+/Cu", 0.001, 0.1) gives 0.059159.
 * @customfunction CONCCELL
 * @helpurl https://localhost:3000/taskpane.html#ref-conccell
 * @param couple The electrode couple, e.g. "Ag+/Ag" or "Cu2+/Cu"; one cell or a column of cases
 * @param value_left Activity of the varying species at the left electrode (mol/L, or bar for a gas)
 * @param value_right Activity of the varying species at the right electrode (mol/L, or bar for a gas)
 * @param [species] The species whose activity differs (default: the couple's only dissolved species)
 * @param [temp_C] Temperature in °C (default 25)
 * @param [table] Your potentials range (default: the built-in table)
 * @returns EMF in V, one row per case
 */
export function CONCCELL(
  couple: any[][],
  value_left: any[][],
  value_right: any[][],
  species?: any[][],
  temp_C?: any[][],
  table?: any[][],
): any[][] {
  return toExcel(catalogue.concCell, couple, value_left, value_right, species, temp_C, table);
}

/**
 * A potential in V converted from one reference-electrode scale to another: SHE, SCE, Ag/AgCl (name the KCl filling), Cu/CuSO4, Hg/Hg2SO4, Hg/HgO, RHE. Example: =ECHEM.VSREF(0, "SCE", "SHE") gives 0.2412.
 * @customfunction VSREF
 * @helpurl https://localhost:3000/taskpane.html#ref-vsref
 * @param potential Potential in V on the from_ref scale; one cell or a column of cases
 * @param from_ref Reference electrode the potential is measured against, e.g. "SCE" or "Ag/AgCl-3M-KCl"
 * @param to_ref Reference electrode to express it against, e.g. "SHE"
 * @param [temp_C] Temperature in °C (default 25)
 * @param [pH] Solution pH (needed with RHE only)
 * @returns Potential in V vs to_ref, one row per case
 */
export function VSREF(
  potential: any[][],
  from_ref: any[][],
  to_ref: any[][],
  temp_C?: any[][],
  pH?: any[][],
): any[][] {
  return toExcel(catalogue.vsRef, potential, from_ref, to_ref, temp_C, pH);
}

/**
 * Activity coefficient γ of an ion at an ionic strength, by the Debye–Hückel limiting law ("limiting"), extended Debye–Hückel ("extended") or Davies ("davies") equation. Example: =ECHEM.ACTCOEF("Ca2+", 0.01, "davies") gives 0.66251.
 * @customfunction ACTCOEF
 * @helpurl https://localhost:3000/taskpane.html#ref-actcoef
 * @param ion The ion, e.g. "Ca2+" or "SO4^2-"; one cell or a column of cases
 * @param ionic_strength Ionic strength I in mol/kg
 * @param [model] "limiting", "extended" or "davies" (default "davies")
 * @param [temp_C] Temperature in °C (default 25)
 * @param [ion_size] Ion size parameter å in Å for "extended" (default: Kielland's value for the ion)
 * @returns γ (dimensionless), one row per case
 */
export function ACTCOEF(
  ion: any[][],
  ionic_strength: any[][],
  model?: any[][],
  temp_C?: any[][],
  ion_size?: any[][],
): any[][] {
  return toExcel(catalogue.actCoef, ion, ionic_strength, model, temp_C, ion_size);
}

/**
 * Activities a = γ·m of the species given at their concentrations, same shape as values; each row's ionic strength comes from that row unless given. Example: =ECHEM.ACTIVITY({"Na+","Cl-"}, {0.01,0.01}) gives 0.0090219 for each.
 * @customfunction ACTIVITY
 * @helpurl https://localhost:3000/taskpane.html#ref-activity
 * @param species Names of the species, one per column of values, e.g. "Na+", "Cl-"
 * @param values Concentrations in mol/kg, one row per case
 * @param [model] "limiting", "extended" or "davies" (default "davies")
 * @param [ionic_strength] Ionic strength I in mol/kg (default: computed from each row)
 * @param [temp_C] Temperature in °C (default 25)
 * @returns Activities, one row per case and one column per species
 */
export function ACTIVITY(
  species: any[][],
  values: any[][],
  model?: any[][],
  ionic_strength?: any[][],
  temp_C?: any[][],
): any[][] {
  return toExcel(catalogue.activity, species, values, model, ionic_strength, temp_C);
}

/**
 * Ionic strength I = ½ Σ mᵢzᵢ² in mol/kg of each row of concentrations. Example: =ECHEM.IONICSTR({"Na+","SO4^2-"}, {0.02,0.01}) gives 0.03.
 * @customfunction IONICSTR
 * @helpurl https://localhost:3000/taskpane.html#ref-ionicstr
 * @param species Names of the ions, one per column of values, e.g. "Na+", "SO4^2-"
 * @param values Concentrations in mol/kg, one row per case
 * @returns I in mol/kg, one row per case
 */
export function IONICSTR(species: any[][], values: any[][]): any[][] {
  return toExcel(catalogue.ionicStr, species, values);
}

/**
 * E° in V of the couple made by chaining steps (Gibbs-energy additivity): Σ nᵢEᵢ° / Σ nᵢ. Example: =ECHEM.COMBINE({0.771,-0.447}, {1,2}) gives -0.041.
 * @customfunction COMBINE
 * @helpurl https://localhost:3000/taskpane.html#ref-combine
 * @param potentials Standard potentials Eᵢ° of the steps in V, a row or a column
 * @param electrons Electrons nᵢ of each step, in the same order
 * @returns E° in V of the overall couple
 */
export function COMBINE(potentials: any[][], electrons: any[][]): any[][] {
  return toExcel(catalogue.combine, potentials, electrons);
}

/**
 * Where an E° comes from: the table rows that gave it (built-in or yours), their published sources, and any derivation. Example: =ECHEM.SOURCE("Cu2+/Cu") names OpenStax Chemistry 2e, Appendix L.
 * @customfunction SOURCE
 * @helpurl https://localhost:3000/taskpane.html#ref-source
 * @param reaction Half-reaction, couple, cell diagram or full reaction; one cell or a column of cases
 * @param [table] Your potentials range (default: the built-in table)
 * @returns Text, one row per case
 */
export function SOURCE(reaction: any[][], table?: any[][]): any[][] {
  return toExcel(catalogue.source, reaction, table);
}

/**
 * IUPAC cell diagram of a cell or reaction, with the activities given written in. Example: =ECHEM.DIAGRAM("Zn + Cu2+ -> Zn2+ + Cu", {"Zn2+","Cu2+"}, {0.1,0.01}) gives Zn(s) | Zn2+(aq, 0.1 M) || Cu2+(aq, 0.01 M) | Cu(s).
 * @customfunction DIAGRAM
 * @helpurl https://localhost:3000/taskpane.html#ref-diagram
 * @param reaction Full reaction, cell diagram or couple; one cell or a column of cases
 * @param [species] Names of the species whose activities follow, one per column of values
 * @param [values] Activities: mol/L for solutes, bar for gases; one row per case
 * @param [table] Your potentials range (default: the built-in table)
 * @returns Cell diagram text, one row per case
 */
export function DIAGRAM(reaction: any[][], species?: any[][], values?: any[][], table?: any[][]): any[][] {
  return toExcel(catalogue.diagram, reaction, species, values, table);
}

/**
 * The built-in table of standard potentials with a header row (half-reaction | E° (V) | dE°/dT (mV/K) | source), optionally only the rows that mention a species or text. Example: =ECHEM.POTENTIALS("Cu") spills the copper couples.
 * @customfunction POTENTIALS
 * @helpurl https://localhost:3000/taskpane.html#ref-potentials
 * @param [filter] A species or text the half-reaction must contain, e.g. "Cu" or "Fe3+" (default: every row)
 * @returns The table, spilled with a header row
 */
export function POTENTIALS(filter?: any[][]): any[][] {
  return toExcel(catalogue.potentials, filter);
}

/**
 * The problems in your potentials table (unbalanced rows, bad numbers, duplicates), one per row, or OK. Example: =ECHEM.CHECKTABLE(A2:D20).
 * @customfunction CHECKTABLE
 * @helpurl https://localhost:3000/taskpane.html#ref-checktable
 * @param table Your potentials range: half-reaction | E° (V) | dE°/dT (mV/K) | source
 * @returns OK, or one message per problem
 */
export function CHECKTABLE(table: any[][]): any[][] {
  return toExcel(catalogue.checkTable, table);
}

// Excel finds each function by its id. Guarded so that the page also loads outside Excel.
if (typeof CustomFunctions !== 'undefined') {
  CustomFunctions.associate('POTENTIAL', POTENTIAL);
  CustomFunctions.associate('STDPOTENTIAL', STDPOTENTIAL);
  CustomFunctions.associate('QUOTIENT', QUOTIENT);
  CustomFunctions.associate('LOGQ', LOGQ);
  CustomFunctions.associate('LOGK', LOGK);
  CustomFunctions.associate('EQCONST', EQCONST);
  CustomFunctions.associate('GIBBS', GIBBS);
  CustomFunctions.associate('ELECTRONS', ELECTRONS);
  CustomFunctions.associate('BALANCE', BALANCE);
  CustomFunctions.associate('NERNSTSLOPE', NERNSTSLOPE);
  CustomFunctions.associate('CONCCELL', CONCCELL);
  CustomFunctions.associate('VSREF', VSREF);
  CustomFunctions.associate('ACTCOEF', ACTCOEF);
  CustomFunctions.associate('ACTIVITY', ACTIVITY);
  CustomFunctions.associate('IONICSTR', IONICSTR);
  CustomFunctions.associate('COMBINE', COMBINE);
  CustomFunctions.associate('SOURCE', SOURCE);
  CustomFunctions.associate('DIAGRAM', DIAGRAM);
  CustomFunctions.associate('POTENTIALS', POTENTIALS);
  CustomFunctions.associate('CHECKTABLE', CHECKTABLE);
}
