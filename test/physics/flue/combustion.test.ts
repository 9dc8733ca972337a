import { describe, expect, it } from 'vitest';
import {
  combustionProducts,
  dryBasisFraction,
  flueGasFromFuel,
  flueGasFromVolumeFractions,
  molarMass,
} from '../../../src/physics/flue/combustion.ts';
import { FUELS, fuelByName, ultimateAnalysisFromGas, validateUltimateAnalysis, type UltimateAnalysis } from '../../../src/physics/flue/fuels.ts';
import { airAsFlueGas, SPECIES_MOLAR_MASS, GAS_SPECIES } from '../../../src/physics/properties/flueGas.ts';
import { MOLAR_MASS_AIR } from '../../../src/physics/constants.ts';

const methane = { name: 'methane', description: 'CH4', kind: 'gas', volumeFractions: { CH4: 1 }, source: 'pure' } as const;
const dry = { combustionAirHumidity: 0 };

describe('flueGasFromFuel', () => {
  it('gives about 9.5 % CO2, 19 % H2O, 71.5 % N2 for stoichiometric methane', () => {
    // Textbook stoichiometry (common practice, from memory): CH4 + 2 (O2 + 3.76 N2) → CO2 + 2 H2O + 7.52 N2,
    // wet fractions 1/10.52 = 9.506 %, 2/10.52 = 19.011 %, 7.52/10.52 = 71.483 %.
    // Tolerance 0.002 (0.2 %-points): the air here is (N2 + Ar)/O2 = 3.7725 rather than 3.76 and
    // carries 0.04 % CO2, which moves each fraction by up to about 0.1 %-points.
    const g = flueGasFromFuel(methane, 0, dry);
    expect(Math.abs(g.CO2 - 0.09506)).toBeLessThan(0.002);
    expect(Math.abs(g.H2O - 0.19011)).toBeLessThan(0.002);
    expect(Math.abs(g.N2 - 0.71483)).toBeLessThan(0.002);
    expect(g.O2).toBe(0);
    expect(g.SO2 + g.SO3).toBe(0);
  });

  it('gives 2.5 % O2 wet (3.0 % dry) for methane with 15 % excess air', () => {
    // Hand calculation: CH4 + 1.15·2 (O2 + 3.76 N2) → CO2 + 2 H2O + 0.3 O2 + 8.648 N2;
    // total 11.948 mol → O2 = 0.3/11.948 = 2.511 % wet; dry 0.3/9.948 = 3.016 %.
    // Common practice (from memory): "3 % O2 dry ≈ 15 % excess air" on natural gas.
    // Tolerance 0.0003: N2:O2 of this air model (3.7725 vs 3.76) shifts O2 by 0.003 %-points.
    const g = flueGasFromFuel(methane, 0.15, dry);
    expect(Math.abs(g.O2 - 0.3 / 11.948)).toBeLessThan(3e-4);
    expect(Math.abs(dryBasisFraction(g, 'O2') - 0.3 / 9.948)).toBeLessThan(3e-4);
  });

  it('returns fractions that sum to 1 for every library fuel', () => {
    // Analytic: normalisation.
    for (const f of Object.values(FUELS)) {
      const g = flueGasFromFuel(f, 0.2);
      expect(GAS_SPECIES.reduce((a, s) => a + g[s], 0)).toBeCloseTo(1, 12);
      for (const s of GAS_SPECIES) expect(g[s]).toBeGreaterThanOrEqual(0);
    }
  });

  it('conserves mass: flue gas = fuel − ash + dry air + air humidity', () => {
    // Analytic: conservation of every element implies conservation of mass (1e-9 relative is
    // round-off; argon counted as N2 is applied consistently to air and flue gas).
    const coal = FUELS['bituminous-coal'];
    const p = combustionProducts(coal, 0.3, { combustionAirHumidity: 0.012, sulfurToSO3: 0 });
    const flueMass = GAS_SPECIES.reduce((a, s) => a + p.molesPerKgFuel[s] * SPECIES_MOLAR_MASS[s], 0);
    const airMolar = GAS_SPECIES.reduce((a, s) => a + airAsFlueGas[s] * SPECIES_MOLAR_MASS[s], 0);
    const inMass = 1 - coal.ultimate.ash + p.dryAirMoles * airMolar + p.airWaterMoles * SPECIES_MOLAR_MASS.H2O;
    expect(Math.abs(flueMass - inMass) / inMass).toBeLessThan(1e-9);
    // humidity: water in per kg of dry air (real dry-air molar mass)
    expect((p.airWaterMoles * SPECIES_MOLAR_MASS.H2O) / (p.dryAirMoles * MOLAR_MASS_AIR)).toBeCloseTo(0.012, 12);
  });

  it('sends the chosen share of the sulfur to SO3 and the rest to SO2', () => {
    // Analytic: sulfur balance, n_S = S / 32.06 g/mol per kg fuel.
    const hfo = FUELS['heavy-fuel-oil'];
    const p = combustionProducts(hfo, 0.1, { sulfurToSO3: 0.05 });
    const nS = hfo.ultimate.S / 0.03206;
    expect(p.molesPerKgFuel.SO3).toBeCloseTo(0.05 * nS, 10);
    expect(p.molesPerKgFuel.SO2).toBeCloseTo(0.95 * nS, 10);
  });

  it('needs 9.52 mol of air per mol of methane at stoichiometry', () => {
    // Textbook (common practice, from memory): 2 × 4.76 = 9.52 mol air per mol CH4. Here the air
    // has 20.946 % O2 → 2/0.20945 = 9.549; tolerance 0.5 % for that air model difference.
    const p = combustionProducts(methane, 0, dry);
    const molCH4PerKg = 1 / (0.012011 + 4 * 0.001008);
    expect(Math.abs(p.dryAirMoles / molCH4PerKg / 9.52 - 1)).toBeLessThan(0.005);
  });

  it('rejects negative excess air and bad analyses', () => {
    expect(() => flueGasFromFuel(methane, -0.1)).toThrow(/excess air/);
    const bad: UltimateAnalysis = { C: 0.5, H: 0.05, O: 0, N: 0, S: 0, moisture: 0, ash: 0 };
    expect(() => flueGasFromFuel(bad, 0.2)).toThrow(/sum to 0.5500/);
    expect(() => flueGasFromFuel(methane, 0.1, { sulfurToSO3: 2 })).toThrow(/sulfurToSO3/);
  });
});

describe('fuels', () => {
  it('converts pure methane to C 74.87 %, H 25.13 % by mass', () => {
    // Hand calculation: 12.011 / (12.011 + 4 × 1.008) = 0.74868.
    const u = ultimateAnalysisFromGas({ CH4: 1 });
    expect(u.C).toBeCloseTo(0.74868, 5);
    expect(u.H).toBeCloseTo(0.25132, 5);
  });

  it('has a valid analysis and a named source for every library fuel', () => {
    for (const name of ['natural-gas', 'light-fuel-oil', 'heavy-fuel-oil', 'bituminous-coal', 'wood']) {
      const f = fuelByName(name);
      expect(f.source.length).toBeGreaterThan(10);
      if (f.kind === 'ultimate') expect(validateUltimateAnalysis(f.ultimate)).toEqual([]);
    }
    expect(() => fuelByName('peat')).toThrow(/known fuels/);
  });
});

describe('flueGasFromVolumeFractions', () => {
  it('normalises the main gases around a fixed SO3 ppm', () => {
    // Analytic: 0.74+0.03+0.11+0.10 = 0.98 is scaled to 1 − 20e-6.
    const g = flueGasFromVolumeFractions({ N2: 0.74, O2: 0.03, CO2: 0.11, H2O: 0.1, SO3Ppm: 20 });
    expect(g.SO3).toBeCloseTo(20e-6, 15);
    expect(g.H2O).toBeCloseTo((0.1 / 0.98) * (1 - 20e-6), 12);
    expect(GAS_SPECIES.reduce((a, s) => a + g[s], 0)).toBeCloseTo(1, 12);
  });

  it('rejects negative fractions', () => {
    expect(() => flueGasFromVolumeFractions({ N2: 0.8, O2: -0.1, CO2: 0.1, H2O: 0.1 })).toThrow(/O2/);
  });
});

describe('molarMass', () => {
  it('gives 27.6 g/mol for stoichiometric methane flue gas', () => {
    // Hand calculation with the textbook 1:2:7.52 mixture: (44.009 + 2·18.015 + 7.52·28.014)/10.52
    // = 27.61 g/mol. Tolerance 0.1 g/mol for the air-model difference noted above.
    expect(Math.abs(molarMass(flueGasFromFuel(methane, 0, dry)) * 1000 - 27.61)).toBeLessThan(0.1);
  });
});
