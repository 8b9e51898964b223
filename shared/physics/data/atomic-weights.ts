/**
 * Atomic weights, index Z − 1.
 *
 * Base: IUPAC standard atomic weights 2013 (J. Meija et al., Pure Appl. Chem. 88, 265 (2016)),
 * Table 1, uncertainties dropped; where IUPAC gives an interval, the conventional value of its
 * Table 3 and the interval beside it. Later CIAAW revisions are applied where marked; the revised
 * values are from memory of the CIAAW reports (2015–2021) and are checked in
 * tests/unit/physics/elements.test.ts against the 2013 table (ASE) and, for the single-isotope
 * elements, against the nuclide mass in chemical-elements.
 *
 * Elements without a stable isotope and without a characteristic terrestrial composition have no
 * standard atomic weight; the common convention (IUPAC periodic table) shows the mass number of a
 * long-lived isotope in brackets. We use the isotope IUPAC 2016 Table 4 lists (as ASE carries it);
 * for the heaviest elements the longest-lived known isotope changes as new ones are found, so the
 * bracket is a label, not a property.
 */

/** Value text as printed ('55.845' or '[98]'), and the interval for conventional values. */
export type AtomicWeightRow = readonly [string, (readonly [number, number])?]

export const ATOMIC_WEIGHT_ROWS: readonly AtomicWeightRow[] = [
  ['1.008', [1.00784, 1.00811]], ['4.002602'], ['6.94', [6.938, 6.997]], ['9.0121831'],
  ['10.81', [10.806, 10.821]], ['12.011', [12.0096, 12.0116]], ['14.007', [14.00643, 14.00728]],
  ['15.999', [15.99903, 15.99977]],
  ['18.998403162'], // F: revised after 2013, single-isotope element (from memory); 2013: 18.998403163
  ['20.1797'], ['22.98976928'], ['24.305', [24.304, 24.307]],
  ['26.9815384'], // Al: revised after 2013, single-isotope element (from memory); 2013: 26.9815385
  ['28.085', [28.084, 28.086]], ['30.973761998'], ['32.06', [32.059, 32.076]], ['35.45', [35.446, 35.457]],
  ['39.95', [39.792, 39.963]], // Ar: interval since CIAAW 2017 (from memory); 2013: 39.948
  ['39.0983'], ['40.078'],
  ['44.955907'], // Sc: revised after 2013, single-isotope element (from memory); 2013: 44.955908
  ['47.867'], ['50.9415'], ['51.9961'],
  ['54.938043'], // Mn: revised after 2013, single-isotope element (from memory); 2013: 54.938044
  ['55.845'], ['58.933194'], ['58.6934'], ['63.546'], ['65.38'], ['69.723'], ['72.630'], ['74.921595'],
  ['78.971'], ['79.904', [79.901, 79.907]], ['83.798'], ['85.4678'], ['87.62'],
  ['88.905838'], // Y: revised after 2013, single-isotope element (from memory); 2013: 88.90584
  ['91.222'], // Zr: CIAAW 2021 (from memory); 2013: 91.224
  ['92.90637'], ['95.95'], ['[98]'], ['101.07'],
  ['102.90549'], // Rh: revised after 2013, single-isotope element (from memory); 2013: 102.90550
  ['106.42'], ['107.8682'], ['112.414'], ['114.818'], ['118.710'], ['121.760'], ['127.60'], ['126.90447'],
  ['131.293'], ['132.90545196'], ['137.327'], ['138.90547'], ['140.116'], ['140.90766'], ['144.242'],
  ['[145]'], ['150.36'], ['151.964'],
  ['157.249'], // Gd: CIAAW 2021 (from memory); 2013: 157.25
  ['158.925354'], // Tb: revised after 2013, single-isotope element (from memory); 2013: 158.92535
  ['162.500'],
  ['164.930329'], // Ho: revised after 2013, single-isotope element (from memory); 2013: 164.93033
  ['167.259'],
  ['168.934219'], // Tm: revised after 2013, single-isotope element (from memory); 2013: 168.93422
  ['173.045'], // Yb: CIAAW 2015 (from memory); 2013: 173.054
  ['174.96669'], // Lu: CIAAW 2021 (from memory); 2013: 174.9668
  ['178.486'], // Hf: CIAAW 2019 (from memory); 2013: 178.49
  ['180.94788'], ['183.84'], ['186.207'], ['190.23'], ['192.217'], ['195.084'],
  ['196.966570'], // Au: revised after 2013, single-isotope element (from memory); 2013: 196.966569
  ['200.592'], ['204.38', [204.382, 204.385]],
  ['207.2', [206.14, 207.94]], // Pb: interval since CIAAW 2020 (from memory), conventional value unchanged
  ['208.98040'], ['[209]'], ['[210]'], ['[222]'], ['[223]'], ['[226]'], ['[227]'], ['232.0377'], ['231.03588'],
  ['238.02891'], ['[237]'], ['[244]'], ['[243]'], ['[247]'], ['[247]'], ['[251]'], ['[252]'], ['[257]'],
  ['[258]'], ['[259]'], ['[262]'], ['[267]'], ['[268]'], ['[271]'], ['[270]'], ['[269]'], ['[278]'],
  ['[281]'], ['[281]'], ['[285]'], ['[286]'], ['[289]'], ['[289]'], ['[293]'], ['[293]'], ['[294]'],
]
