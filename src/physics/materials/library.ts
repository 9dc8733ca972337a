/**
 * The built-in wall material library.
 *
 * HONESTY NOTE: every number in this file was written FROM MEMORY of the named handbook tables and
 * of typical manufacturers' data sheets; none was copied from the source while writing it. The
 * values are meant to be plausible and physically consistent (right order of magnitude, right
 * trend with temperature), not exact. Check them against the named source (or the data sheet of
 * the product actually used) before relying on a result. Where a source gives only one value (for
 * example cp at 300 K for refractories in Incropera Table A.3), the trend with temperature is
 * "common practice" for that class of material and says so in `source`.
 *
 * Mechanical values (Young's modulus, expansion, Poisson's ratio) feed only the thermal-stress
 * indicator; for insulations they are nominal (such layers carry no load).
 */
import type { Material, PropertyTable } from './types.ts';

/** Build a table from [temperatureK, value] pairs (readability only). */
function table(pairs: readonly (readonly [number, number])[]): PropertyTable {
  return Object.freeze({
    temperatureK: Object.freeze(pairs.map((p) => p[0])),
    values: Object.freeze(pairs.map((p) => p[1])),
  });
}

const carbonSteel: Material = {
  name: 'carbon-steel',
  description: 'Plain carbon steel shell or liner plate (Mn ≤ 1 %, Si ≤ 0.1 %), oxidised surface',
  kind: 'solid',
  density: 7854,
  // Incropera Table A.1, plain carbon steel: k at 300, 400, 600, 800, 1000 K.
  conductivity: table([[300, 60.5], [400, 56.7], [600, 48.0], [800, 39.2], [1000, 30.0]]),
  // Incropera Table A.1, plain carbon steel: cp at 300, 400, 600, 800, 1000 K (the rise towards
  // 1000 K is the magnetic transition near the Curie point, ~1043 K).
  specificHeat: table([[300, 434], [400, 487], [600, 559], [800, 685], [1000, 1169]]),
  emissivity: 0.8, // oxidised steel, Incropera Table A.12 range 0.79–0.8 (from memory)
  maxServiceTemperatureK: 723.15, // 450 °C: creep / scaling limit of plain carbon steel, common practice
  youngsModulus: 200e9,
  thermalExpansion: 12e-6,
  poissonRatio: 0.29,
  source:
    'Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, Table A.1 (plain carbon steel), from memory; ' +
    'emissivity Table A.12 (oxidised steel), from memory; service limit and mechanical values common practice',
};

const stainlessSteel: Material = {
  name: 'stainless-steel',
  description: 'Austenitic stainless steel AISI 304 liner or shell, lightly oxidised surface',
  kind: 'solid',
  density: 7900,
  // Incropera Table A.1, AISI 304.
  conductivity: table([[100, 9.2], [200, 12.6], [300, 14.9], [400, 16.6], [600, 19.8], [800, 22.6], [1000, 25.4], [1200, 28.0], [1500, 31.7]]),
  specificHeat: table([[100, 272], [200, 402], [300, 477], [400, 515], [600, 557], [800, 582], [1000, 611], [1200, 640], [1500, 682]]),
  emissivity: 0.6, // lightly oxidised 304; polished ≈ 0.17, heavily oxidised ≈ 0.85 (Incropera Table A.12, from memory)
  maxServiceTemperatureK: 1173.15, // 900 °C continuous oxidation limit of 304 in air, common practice (data sheets give ~870–925 °C)
  youngsModulus: 193e9,
  thermalExpansion: 17.3e-6,
  poissonRatio: 0.29,
  source:
    'Incropera & DeWitt, Table A.1 (AISI 304), from memory; emissivity Table A.12, from memory; ' +
    'service limit and mechanical values from typical 304 data sheets, from memory',
};

const fireclayBrick: Material = {
  name: 'fireclay-brick',
  description: 'Fireclay refractory brick (burnt at 1600 K), medium duty',
  kind: 'solid',
  density: 2050,
  // Incropera Table A.3, fireclay brick burnt 1600 K: k 1.0, 1.1, 1.1 at 773, 1073, 1373 K;
  // the 300 K point is extrapolated (common practice: dense aluminosilicates ~0.9–1.0 cold).
  conductivity: table([[300, 0.9], [773, 1.0], [1073, 1.1], [1373, 1.1]]),
  // Incropera Table A.3 gives cp = 960 J/(kg K) at 300 K; rise with T common practice for aluminosilicates.
  specificHeat: table([[300, 960], [600, 1060], [900, 1130], [1200, 1180], [1500, 1220]]),
  emissivity: 0.75, // fireclay at high temperature, Incropera Table A.12 (from memory)
  maxServiceTemperatureK: 1573.15, // 1300 °C, medium-duty fireclay, common practice
  youngsModulus: 20e9,
  thermalExpansion: 5.5e-6,
  poissonRatio: 0.2,
  source:
    'Incropera & DeWitt, Table A.3 (fireclay brick, burnt 1600 K) for density, k and cp at 300 K, from memory; ' +
    'cp trend, 300 K conductivity, service limit and mechanical values common practice',
};

const insulatingFirebrick: Material = {
  name: 'insulating-firebrick',
  description: 'Insulating firebrick, ASTM C155 group 23 (1260 °C class)',
  kind: 'solid',
  density: 500,
  // Typical group-23 data sheet values at mean temperatures 260, 538, 816, 1093 °C (533, 811, 1089, 1366 K).
  conductivity: table([[300, 0.12], [533, 0.14], [811, 0.16], [1089, 0.19], [1366, 0.23]]),
  specificHeat: table([[300, 880], [600, 1000], [900, 1080], [1200, 1130]]),
  emissivity: 0.8,
  maxServiceTemperatureK: 1533.15, // group 23: 1260 °C (2300 °F) classification
  youngsModulus: 1.5e9,
  thermalExpansion: 5e-6,
  poissonRatio: 0.2,
  source:
    "ASTM C155 group 23 class and manufacturers' typical data sheets for k(T) and density, from memory; " +
    'cp trend, emissivity and mechanical values common practice',
};

const denseCastable: Material = {
  name: 'dense-castable',
  description: 'Dense refractory castable, conventional ~45 % alumina',
  kind: 'solid',
  density: 2250,
  conductivity: table([[300, 1.2], [673, 1.2], [1073, 1.3], [1473, 1.45]]),
  specificHeat: table([[300, 880], [673, 1000], [1073, 1100], [1473, 1150]]),
  emissivity: 0.8,
  maxServiceTemperatureK: 1673.15, // 1400 °C, common practice for conventional dense castables
  youngsModulus: 30e9,
  thermalExpansion: 6e-6,
  poissonRatio: 0.2,
  source: "Manufacturers' typical data sheets for conventional dense castables, from memory; mechanical values common practice",
};

const clayFlueLiner: Material = {
  name: 'clay-flue-liner',
  description: 'Vitrified fired-clay flue liner tile (ASTM C315 type)',
  kind: 'solid',
  density: 2000,
  conductivity: table([[300, 0.95], [600, 1.05], [900, 1.15], [1200, 1.2]]),
  // 840 J/(kg K) at 300 K as for clay tile/brick (ASHRAE Handbook Fundamentals ch. 26), rising per common practice.
  specificHeat: table([[300, 840], [600, 1000], [900, 1080], [1200, 1120]]),
  emissivity: 0.85,
  maxServiceTemperatureK: 1255.15, // ~1800 °F, common practice for clay flue liners in service
  youngsModulus: 20e9,
  thermalExpansion: 5.5e-6,
  poissonRatio: 0.2,
  source:
    'ASTM C315 (product class); ASHRAE Handbook Fundamentals ch. 26 (clay tile) for cp and density order, from memory; ' +
    'k(T), service limit and mechanical values common practice',
};

const commonBrick: Material = {
  name: 'common-brick',
  description: 'Common building brick (red clay), masonry shell or windshield',
  kind: 'solid',
  density: 1920,
  // Incropera Table A.3, brick, common: k 0.72, cp 835 at 300 K; rise with T common practice.
  conductivity: table([[300, 0.72], [500, 0.8], [800, 0.9]]),
  specificHeat: table([[300, 835], [500, 950], [800, 1050]]),
  emissivity: 0.93, // red brick, Incropera Table A.11 (0.93–0.96), from memory
  maxServiceTemperatureK: 973.15, // 700 °C, common practice for ordinary building brick
  youngsModulus: 14e9,
  thermalExpansion: 6e-6,
  poissonRatio: 0.2,
  source:
    'Incropera & DeWitt, Table A.3 (brick, common) at 300 K, from memory; emissivity Table A.11, from memory; ' +
    'trend with T, service limit and mechanical values common practice',
};

const concrete: Material = {
  name: 'concrete',
  description: 'Normal-weight structural concrete (stone mix), concrete windshield or shell',
  kind: 'solid',
  density: 2300,
  // 1.4 W/(m K) at 300 K from Incropera Table A.3 (stone mix); the fall with T follows the shape of
  // the EN 1992-1-2 lower-limit curve (scaled to 1.4 at 300 K), from memory.
  conductivity: table([[300, 1.4], [473, 1.17], [673, 0.95], [873, 0.79]]),
  // 880 at 300 K (Incropera Table A.3); from 100 °C upward the dry-concrete (u = 0 %) curve of
  // EN 1992-1-2:2004, clause 3.3.2(1), eq. (3.9), from memory: cp = 900 J/(kg K) for 20–100 °C,
  // 900 + (θ − 100) for 100–200 °C, 1000 + (θ − 200)/2 for 200–400 °C, 1100 for 400–1200 °C.
  // That curve is piecewise linear with corners at 100, 200 and 400 °C, so these points reproduce
  // it exactly from 100 to 1200 °C (held at 1100 above). Between 300 K and 100 °C the table rises
  // from the handbook's room-temperature 880 to the standard's 900 (within 2.3 % of EN there).
  // The moisture peak of EN 3.3.2(2) (up to 2020 J/(kg K) at 100–115 °C for 3 % water) is not
  // included: a stack's concrete dries out in service.
  specificHeat: table([[300, 880], [373.15, 900], [473.15, 1000], [673.15, 1100]]),
  emissivity: 0.9, // concrete, Incropera Table A.11 (0.88–0.93), from memory
  maxServiceTemperatureK: 573.15, // 300 °C: strength loss of structural concrete, common practice
  youngsModulus: 30e9,
  thermalExpansion: 10e-6,
  poissonRatio: 0.2,
  source:
    'Incropera & DeWitt, Table A.3 (concrete, stone mix) at 300 K, from memory; k trend with T after EN 1992-1-2 clause 3.3.3 (lower limit), ' +
    'cp from 100 °C up per EN 1992-1-2 clause 3.3.2(1) eq. (3.9), dry concrete, from memory; ' +
    'service limit and mechanical values common practice',
};

const mineralWool: Material = {
  name: 'mineral-wool',
  description: 'Mineral (rock) wool blanket or board, ~128 kg/m³ (ASTM C592 / C612 class)',
  kind: 'solid',
  density: 128,
  // Typical data-sheet k at mean temperatures 24, 93, 204, 316, 427, 538 °C.
  conductivity: table([[297, 0.036], [366, 0.044], [477, 0.058], [589, 0.077], [700, 0.1], [811, 0.128]]),
  specificHeat: table([[300, 840], [500, 920], [800, 1000]]),
  emissivity: 0.9, // outer face is normally cladded; value for the fibre surface, common practice
  maxServiceTemperatureK: 922.15, // 650 °C (1200 °F), common practice for rock wool pipe and block insulation
  youngsModulus: 1e6, // nominal: carries no load
  thermalExpansion: 5e-6,
  poissonRatio: 0.1,
  source:
    "ASTM C592 / C612 (product classes) and manufacturers' typical data sheets for k(T), from memory; " +
    'cp, emissivity and mechanical values common practice (mechanical values nominal)',
};

const ceramicFibreBlanket: Material = {
  name: 'ceramic-fibre-blanket',
  description: 'Aluminosilicate ceramic fibre blanket, 128 kg/m³, 1260 °C class (limit = continuous use)',
  kind: 'solid',
  density: 128,
  // Typical data sheets, 128 kg/m³ blanket, k at mean 200, 400, 600, 800, 1000 °C; 300 K point common practice.
  conductivity: table([[300, 0.035], [473, 0.05], [673, 0.085], [873, 0.13], [1073, 0.18], [1273, 0.25]]),
  specificHeat: table([[300, 850], [600, 1000], [900, 1080], [1200, 1130]]),
  emissivity: 0.85,
  maxServiceTemperatureK: 1373.15, // 1100 °C continuous use for the 1260 °C classification, common practice
  youngsModulus: 1e6, // nominal: carries no load
  thermalExpansion: 5e-6,
  poissonRatio: 0.1,
  source: "Manufacturers' typical data sheets for 128 kg/m³ aluminosilicate blanket, from memory; mechanical values nominal",
};

const calciumSilicate: Material = {
  name: 'calcium-silicate',
  description: 'Calcium silicate block insulation, ASTM C533 Type I (650 °C), ~240 kg/m³',
  kind: 'solid',
  density: 240,
  // Typical C533 Type I values at mean temperatures 38, 93, 149, 204, 260, 316, 371, 427 °C.
  conductivity: table([[311, 0.055], [366, 0.059], [422, 0.065], [477, 0.071], [533, 0.077], [589, 0.084], [644, 0.091], [700, 0.098]]),
  specificHeat: table([[300, 840], [500, 920], [700, 1000]]),
  emissivity: 0.9,
  maxServiceTemperatureK: 922.15, // 650 °C (1200 °F), ASTM C533 Type I
  youngsModulus: 3e8,
  thermalExpansion: 6.5e-6,
  poissonRatio: 0.2,
  source:
    "ASTM C533 Type I and manufacturers' typical data sheets for k(T) and density, from memory; " +
    'cp, emissivity and mechanical values common practice',
};

const airGap: Material = {
  name: 'air-gap',
  description: 'Still-air gap between two layers (conduction, radiation and convection; no nodes)',
  kind: 'gap',
  density: 0,
  // Unused for a gap (air properties come from src/properties/air.ts); single valid dummy point:
  // air at 300 K, Incropera Table A.4 (from memory).
  conductivity: table([[300, 0.0263]]),
  specificHeat: table([[300, 1007]]),
  emissivity: 0.8, // typical oxidised metal / masonry surfaces facing the gap, common practice
  maxServiceTemperatureK: 10000, // no limit of its own
  youngsModulus: 0,
  thermalExpansion: 0,
  poissonRatio: 0,
  source: 'Air properties from Incropera & DeWitt Table A.4 (via src/properties/air.ts), from memory; surface emissivity common practice',
};

/** Every built-in material, keyed by its kebab-case name (the key equals `material.name`). */
export const MATERIALS: Readonly<Record<string, Material>> = Object.freeze(
  Object.fromEntries(
    [
      carbonSteel,
      stainlessSteel,
      fireclayBrick,
      insulatingFirebrick,
      denseCastable,
      clayFlueLiner,
      commonBrick,
      concrete,
      mineralWool,
      ceramicFibreBlanket,
      calciumSilicate,
      airGap,
    ].map((m) => [m.name, Object.freeze(m)] as const),
  ),
);
